import type { Db } from '@/db/client';
import { newId } from '@/db/new-id';
import { ENGINE_VERSION } from '@/lib/calc';
import { idTaken, notFound, versionConflict } from '@/server/app-error';
import { recordAudit, type Actor } from '@/server/api/audit/audit.repository';
import type { Created } from '@/server/api/client-ids';
import { findMember } from '@/server/api/members/members.repository';
import { openJob } from '@/server/api/screens/screens.service';
import { sameContent } from '@/server/services/idempotency/idempotency-store';
import type { ShoringPlanPut, ShoringRecord } from '@/shared/schemas/shoring-plans';
import { evaluateShoring } from './shoring-evaluate';
import { findShoring, findShoringByPlanId, saveShoring } from './shoring.repository';

/**
 * Whether a save may go ahead over `saved` (the member's plan now, if any), by the sync fields
 * (docs/sync-protocol.md): with `baseVersion` it is an edit of that version; else with `id` the plan's
 * first save, which answers the plan already made by the same save (true) and refuses any other plan.
 */
function replaysFirstSave(
  saved: ShoringRecord | undefined,
  actor: Actor,
  body: ShoringPlanPut,
  input: ShoringRecord['input'],
): boolean {
  const { id, baseVersion } = body;
  if (baseVersion !== undefined) {
    if (saved && saved.version !== baseVersion) throw versionConflict('This shoring plan', saved);
    return false;
  }
  if (!id) return false;
  if (!saved) return false;
  if (saved.id !== id) throw versionConflict('This shoring plan', saved);
  if (saved.version === 1 && saved.updatedBy === actor.userId && sameContent(saved.input, input)) return true;
  throw idTaken();
}

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

    save(actor: Actor, memberId: string, body: ShoringPlanPut): Created<{ shoring: ShoringRecord }> {
      const { id, baseVersion: _baseVersion, ...input } = body;
      return db.transaction((tx) => {
        const member = findMember(tx, actor.orgId, memberId);
        if (!member) throw notFound('Member');
        const saved = findShoring(tx, actor.orgId, memberId);
        if (id && !saved) {
          const holder = findShoringByPlanId(tx, id);
          if (holder) throw idTaken();
        }
        if (replaysFirstSave(saved, actor, body, input) && saved) {
          return { record: { shoring: saved }, replayed: true };
        }
        openJob(tx, actor.orgId, member.jobId);
        const result = evaluateShoring(member.input, input);
        saveShoring(tx, actor.orgId, {
          id: saved?.id ?? id ?? newId(),
          memberId,
          jobId: member.jobId,
          input,
          result,
          engineVersion: ENGINE_VERSION,
          updatedBy: actor.userId,
        });
        recordAudit(tx, actor, {
          action: 'shoring.save',
          subject: memberId,
          detail: { jobId: member.jobId, method: input.method, pass: result.pass },
        });
        const now = findShoring(tx, actor.orgId, memberId);
        if (!now) throw notFound('Shoring plan');
        return { record: { shoring: now }, replayed: false };
      });
    },
  };
}

export type ShoringService = ReturnType<typeof createShoringService>;
