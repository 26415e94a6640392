import useSWR from 'swr';
import { fetchJobs } from '@/lib/api/jobs';
import { keys } from '@/lib/api/keys';
import { useMe } from './use-me';

/** The active firm's jobs, newest first as the API returns them. */
export function useJobs() {
  const { data: me } = useMe();
  return useSWR(me ? keys.jobs(me.activeOrgId) : null, fetchJobs);
}
