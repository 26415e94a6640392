import { and, desc, eq, inArray, sql } from 'drizzle-orm';
import type { DbOrTx } from '@/db/client';
import { designRequests } from '@/db/schema';
import { findMember, listMembers } from '@/server/api/members/members.repository';
import type { MemberDesign } from '@/shared/schemas/requests/member-design';
import { latestReply } from './requests.repository';

/**
 * The engineer's member for each member of the firm's job that a Designed (or Closed) request answers; when
 * two requests design the same member, the one designed last. Members no longer on the job are left out.
 */
export function designsOfJob(db: DbOrTx, orgId: string, jobId: string): MemberDesign[] {
  const requests = db
    .select()
    .from(designRequests)
    .where(
      and(
        eq(designRequests.orgId, orgId),
        eq(designRequests.jobId, jobId),
        inArray(designRequests.status, ['designed', 'closed']),
      ),
    )
    .orderBy(desc(designRequests.updatedAt), desc(sql`${designRequests}.rowid`))
    .all();
  const members = new Map(listMembers(db, orgId, jobId).map((m) => [m.id, m]));
  const designs = new Map<string, MemberDesign>();
  for (const request of requests) {
    const reply = latestReply(db, request.id);
    if (!reply) continue;
    for (const designed of reply.reply.members) {
      const member = members.get(designed.memberId);
      if (!member || designs.has(member.id)) continue;
      designs.set(member.id, {
        ...designed,
        requestId: request.id,
        requestNumber: request.number,
        version: reply.version,
        designedAt: reply.createdAt,
        preliminaryLabel: `${member.summary.sizeLabel} ${member.summary.materialLabel}`,
      });
    }
  }
  return [...designs.values()];
}

/** The engineer's member for one member of the firm, or undefined while none supersedes its size. */
export function designOfMember(db: DbOrTx, orgId: string, memberId: string): MemberDesign | undefined {
  const member = findMember(db, orgId, memberId);
  if (!member) return undefined;
  return designsOfJob(db, orgId, member.jobId).find((d) => d.memberId === memberId);
}
