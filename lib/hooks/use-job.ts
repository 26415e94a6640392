import useSWR from 'swr';
import { fetchJob } from '@/lib/api/jobs';
import { keys } from '@/lib/api/keys';
import { useMe } from './use-me';

export function useJob(jobId: string | undefined) {
  const { data: me } = useMe();
  return useSWR(me && jobId ? keys.job(me.activeOrgId, jobId) : null, () => fetchJob(jobId as string));
}
