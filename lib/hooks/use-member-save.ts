import { useRouter } from 'expo-router';
import { useCallback } from 'react';
import { useSWRConfig } from 'swr';
import { ApiError } from '@/lib/api/client';
import { keys } from '@/lib/api/keys';
import { createMember, updateMember } from '@/lib/api/structural-members';
import type { SaveOutcome } from '@/lib/ui/member/member-editor';
import type { MemberCreateBody } from '@/shared/schemas/members';
import { useMe } from './use-me';

/**
 * Saves a member of a job: a new one is created and the page moves to its own address; an existing one is
 * updated. The job's member list and the member's cache take the server's answer.
 */
export function useMemberSave(jobId: string, memberId?: string) {
  const { data: me } = useMe();
  const { mutate } = useSWRConfig();
  const router = useRouter();
  const orgId = me?.activeOrgId ?? '';
  return useCallback(
    async (body: MemberCreateBody): Promise<SaveOutcome> => {
      try {
        const member = memberId ? await updateMember(memberId, body) : await createMember(jobId, body);
        await Promise.all([
          mutate(keys.member(orgId, member.id), member, { revalidate: false }),
          mutate(keys.jobMembers(orgId, jobId)),
        ]);
        if (!memberId)
          router.replace({
            pathname: '/jobs/[jobId]/members/[memberId]',
            params: { jobId, memberId: member.id, saved: '1' },
          });
        return { ok: true, member };
      } catch (error) {
        if (!(error instanceof ApiError)) throw error;
        return { ok: false, fields: error.fields, message: error.message };
      }
    },
    [jobId, memberId, mutate, orgId, router],
  );
}
