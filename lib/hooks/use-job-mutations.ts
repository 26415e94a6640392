import { useRouter } from 'expo-router';
import { useCallback } from 'react';
import { useSWRConfig } from 'swr';
import { archiveJob, createJob, updateJob } from '@/lib/api/jobs';
import { keys } from '@/lib/api/keys';
import type { JobInput } from '@/shared/schemas/jobs';
import { useMe } from './use-me';

/** Create, update and archive jobs of the active firm, refreshing the cached list and job. */
export function useJobMutations() {
  const { data: me } = useMe();
  const { mutate } = useSWRConfig();
  const router = useRouter();
  const orgId = me?.activeOrgId ?? '';

  return {
    create: useCallback(
      async (input: JobInput) => {
        const job = await createJob(input);
        await mutate(keys.jobs(orgId));
        router.replace({ pathname: '/jobs/[jobId]', params: { jobId: job.id } });
      },
      [mutate, orgId, router],
    ),
    /** Saves the job and returns the members the server checked again with its new values. */
    update: useCallback(
      async (jobId: string, input: JobInput) => {
        const { recomputed, ...job } = await updateJob(jobId, input);
        await Promise.all([
          mutate(keys.job(orgId, jobId), job, { revalidate: false }),
          mutate(keys.jobs(orgId)),
          recomputed.length > 0 ? mutate(keys.jobMembers(orgId, jobId)) : undefined,
        ]);
        return recomputed;
      },
      [mutate, orgId],
    ),
    archive: useCallback(
      async (jobId: string) => {
        await archiveJob(jobId);
        await mutate(keys.jobs(orgId));
        router.replace('/jobs');
      },
      [mutate, orgId, router],
    ),
  };
}
