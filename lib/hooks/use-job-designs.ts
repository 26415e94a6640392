import useSWR from 'swr';
import { keys } from '@/lib/api/keys';
import { fetchJobDesigns } from '@/lib/api/member-designs';
import { useMe } from './use-me';

/** The engineer's designed members of a job (from its Designed requests), one per member. */
export function useJobDesigns(jobId: string | undefined) {
  const { data: me } = useMe();
  return useSWR(me && jobId ? keys.jobDesigns(me.activeOrgId, jobId) : null, () =>
    fetchJobDesigns(jobId as string),
  );
}
