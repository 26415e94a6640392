import type { Db } from '@/db/client';
import { ENGINE_VERSION } from '@/lib/calc';
import { notFound } from '@/server/app-error';
import { recordAudit, type Actor } from '@/server/api/audit/audit.repository';
import { findMember } from '@/server/api/members/members.repository';
import { openJob } from '@/server/api/screens/screens.service';
import type { ShoringPlanBody, ShoringRecord } from '@/shared/schemas/shoring-plans';
import { evaluateShoring } from './shoring-evaluate';
import { findShoring, saveShoring } from './shoring.repository';

/**
 * The temporary shoring plan of a member of the actor's firm, recomputed by the server on every save from
 * the member's saved loads. A member of another firm is "not found"; an archived job's plan is read-only.
 */
export function createShoringService(db: Db) {
  return {
    get(orgId: string, memberId: string): { shoring: ShoringRecord | null } {
      if (!findMember(db, orgId, memberId)) throw notFound('Member');
      return { shoring: findShoring(db, orgId, memberId) ?? null };
    },

    save(actor: Actor, memberId: string, body: ShoringPlanBody): { shoring: ShoringRecord } {
      return db.transaction((tx) => {
        const member = findMember(tx, actor.orgId, memberId);
        if (!member) throw notFound('Member');
        openJob(tx, actor.orgId, member.jobId);
        const result = evaluateShoring(member.input, body);
        saveShoring(tx, actor.orgId, {
          memberId,
          jobId: member.jobId,
          input: body,
          result,
          engineVersion: ENGINE_VERSION,
          updatedBy: actor.userId,
        });
        recordAudit(tx, actor, {
          action: 'shoring.save',
          subject: memberId,
          detail: { jobId: member.jobId, method: body.method, pass: result.pass },
        });
        const saved = findShoring(tx, actor.orgId, memberId);
        if (!saved) throw notFound('Shoring plan');
        return { shoring: saved };
      });
    },
  };
}

export type ShoringService = ReturnType<typeof createShoringService>;
