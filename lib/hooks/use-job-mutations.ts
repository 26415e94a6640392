import { useRouter } from 'expo-router';
import { useCallback } from 'react';
import { useSWRConfig } from 'swr';
import { noContentSchema } from '@/lib/api/client';
import { keys } from '@/lib/api/keys';
import { cacheKey, nextVersion, queueWrite, withBaseVersion } from '@/lib/offline/queue-write';
import { jobUpdateResultSchema, type MemberRecompute } from '@/shared/schemas/job-update';
import { jobInputSchema, jobSchema, type Job, type JobInput } from '@/shared/schemas/jobs';
import { useMe } from './use-me';

/**
 * Create, update and archive jobs of the active firm. Creates, edits and archiving go through the device's queue (a
 * new job gets its id here), so they work with no signal; the cached list and job follow.
 */
export function useJobMutations() {
  const { data: me } = useMe();
  const { mutate } = useSWRConfig();
  const router = useRouter();
  const orgId = me?.activeOrgId ?? '';

  return {
    create: useCallback(
      async (input: JobInput) => {
        const id = crypto.randomUUID();
        const now = new Date().toISOString();
        const local = {
          ...jobInputSchema.parse(input),
          id,
          orgId,
          version: 1,
          createdAt: now,
          updatedAt: now,
          archivedAt: null,
        };
        const saved = await queueWrite(jobSchema, {
          key: crypto.randomUUID(),
          orgId,
          entity: 'job',
          create: true,
          recordId: id,
          group: id,
          label: `New job ${local.name}`,
          method: 'POST',
          path: '/api/jobs',
          body: { ...input, id },
          localRecord: local,
          cache: { recordKey: cacheKey(keys.job(orgId, id)), listKey: cacheKey(keys.jobs(orgId)) },
        });
        const jobId = saved.data?.id ?? id;
        router.replace({ pathname: '/jobs/[jobId]', params: { jobId } });
      },
      [orgId, router],
    ),
    /**
     * Saves the job on the version it was read at and returns the members the server checked again with
     * its new values (none while the change waits on the device: the server checks them when it arrives).
     */
    update: useCallback(
      async (job: Job, input: JobInput): Promise<MemberRecompute[]> => {
        const local = nextVersion({
          ...job,
          ...jobInputSchema.parse(input),
          updatedAt: new Date().toISOString(),
        });
        const saved = await queueWrite(jobUpdateResultSchema, {
          key: crypto.randomUUID(),
          orgId,
          entity: 'job',
          create: false,
          recordId: job.id,
          group: job.id,
          label: `Job ${local.name} changed`,
          method: 'PATCH',
          path: `/api/jobs/${encodeURIComponent(job.id)}`,
          body: withBaseVersion(input, job),
          localRecord: local,
          cache: { recordKey: cacheKey(keys.job(orgId, job.id)), listKey: cacheKey(keys.jobs(orgId)) },
        });
        if (saved.state !== 'sent') return [];
        const { recomputed } = saved.data;
        if (recomputed.length > 0) await mutate(keys.jobMembers(orgId, job.id));
        return recomputed;
      },
      [mutate, orgId],
    ),
    archive: useCallback(
      async (jobId: string) => {
        // Through the device's queue like every other write: one key, works offline, shows as waiting.
        await queueWrite(noContentSchema, {
          key: crypto.randomUUID(),
          orgId,
          entity: 'job',
          create: false,
          recordId: jobId,
          group: jobId,
          label: 'Job archived',
          method: 'DELETE',
          path: `/api/jobs/${encodeURIComponent(jobId)}`,
          body: undefined,
          cache: { recordKey: cacheKey(keys.job(orgId, jobId)), listKey: cacheKey(keys.jobs(orgId)) },
        });
        router.replace('/jobs');
      },
      [orgId, router],
    ),
  };
}
