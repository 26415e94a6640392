import useSWR from 'swr';
import { keys } from '@/lib/api/keys';
import { fetchJobMembers } from '@/lib/api/structural-members';
import { useMe } from './use-me';

/** The headers and beams saved on a job, with their summaries. */
export function useJobMembers(jobId: string | undefined) {
  const { data: me } = useMe();
  return useSWR(me && jobId ? keys.jobMembers(me.activeOrgId, jobId) : null, () =>
    fetchJobMembers(jobId as string),
  );
}
