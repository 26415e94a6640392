import useSWR from 'swr';
import { fetchJobProgress } from '@/lib/api/job-checklist';
import { keys } from '@/lib/api/keys';
import { useMe } from './use-me';

/** Every open job's checklist progress and engineer-needed mark, for the jobs list. */
export function useJobProgress() {
  const { data: me } = useMe();
  return useSWR(me ? keys.jobProgress(me.activeOrgId) : null, fetchJobProgress);
}
