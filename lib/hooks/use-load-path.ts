import { useCallback } from 'react';
import useSWR, { useSWRConfig } from 'swr';
import { keys } from '@/lib/api/keys';
import { fetchLoadPath } from '@/lib/api/load-path';
import { useMe } from './use-me';

/** The job's load path as the server checked it. */
export function useLoadPath(jobId: string | undefined) {
  const { data: me } = useMe();
  return useSWR(me && jobId ? keys.loadPath(me.activeOrgId, jobId) : null, () =>
    fetchLoadPath(jobId as string),
  );
}

/**
 * After a change to the load path: the path itself, and every member's state on the job page and member
 * page (a change re-checks everything below it).
 */
export function useLoadPathRefresh(jobId: string) {
  const { data: me } = useMe();
  const { mutate } = useSWRConfig();
  const orgId = me?.activeOrgId ?? '';
  return useCallback(async () => {
    await mutate(keys.loadPath(orgId, jobId));
    await mutate(keys.jobMembers(orgId, jobId));
    await mutate((key) => Array.isArray(key) && key[0] === 'member' && key[1] === orgId);
  }, [mutate, orgId, jobId]);
}
