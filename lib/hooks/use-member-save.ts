import { useRouter } from 'expo-router';
import { useCallback } from 'react';
import { ApiError } from '@/lib/api/client';
import { keys } from '@/lib/api/keys';
import { cacheKey, nextVersion, queueWrite, withBaseVersion } from '@/lib/offline/queue-write';
import type { DeviceMemberFields } from '@/lib/ui/member/device-member';
import type { SaveOutcome } from '@/lib/ui/member/member-editor';
import { memberSchema, type Member, type MemberCreateBody } from '@/shared/schemas/members';
import { useMe } from './use-me';

/**
 * Saves a member of a job through the device's queue: a new one gets its id here (the server keeps it) and
 * the page moves to its own address; an existing one is updated on the version it was read at. Online the
 * server's answer replaces the cache; with no signal the device's own result shows until it is sent.
 */
export function useMemberSave(jobId: string, member?: Member) {
  const { data: me } = useMe();
  const router = useRouter();
  return useCallback(
    async (body: MemberCreateBody, device: DeviceMemberFields): Promise<SaveOutcome> => {
      if (!me) return { ok: false, fields: {}, message: 'Sign in again to save.' };
      const orgId = me.activeOrgId;
      const id = member?.id ?? crypto.randomUUID();
      const now = new Date().toISOString();
      const local: Member = {
        ...(member ?? { version: 1, createdBy: me.user.id, createdAt: now }),
        ...device,
        id,
        jobId,
        label: body.label,
        wall: body.wall ?? '',
        updatedBy: me.user.id,
        updatedAt: now,
      } as Member;
      try {
        const saved = await queueWrite(memberSchema, {
          key: crypto.randomUUID(),
          orgId,
          entity: 'member',
          create: !member,
          recordId: id,
          group: jobId,
          label: member ? `Member ${body.label} changed` : `New member ${body.label}`,
          method: member ? 'PATCH' : 'POST',
          path: member
            ? `/api/members/${encodeURIComponent(id)}`
            : `/api/jobs/${encodeURIComponent(jobId)}/members`,
          body: member ? withBaseVersion(body, member) : { ...body, id },
          localRecord: member ? nextVersion(local) : local,
          cache: {
            recordKey: cacheKey(keys.member(orgId, id)),
            listKey: cacheKey(keys.jobMembers(orgId, jobId)),
          },
        });
        const shown = saved.data ?? local;
        if (!member)
          router.replace({
            pathname: '/jobs/[jobId]/members/[memberId]',
            params: { jobId, memberId: shown.id, saved: saved.state === 'sent' ? '1' : 'device' },
          });
        return { ok: true, member: shown, onDevice: saved.state === 'waiting' };
      } catch (error) {
        if (!(error instanceof ApiError)) throw error;
        return { ok: false, fields: error.fields, message: error.message };
      }
    },
    [jobId, member, me, router],
  );
}
