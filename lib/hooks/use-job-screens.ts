import useSWR from 'swr';
import { fetchJobScreens } from '@/lib/api/bearing-screens';
import { keys } from '@/lib/api/keys';
import { useMe } from './use-me';

/** The job's bearing screens and its "engineer needed" mark. */
export function useJobScreens(jobId: string | undefined) {
  const { data: me } = useMe();
  return useSWR(me && jobId ? keys.jobScreens(me.activeOrgId, jobId) : null, () =>
    fetchJobScreens(jobId as string),
  );
}
