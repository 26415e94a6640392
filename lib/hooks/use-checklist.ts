import { useCallback } from 'react';
import useSWR, { useSWRConfig } from 'swr';
import { fetchChecklist, updateChecklistItem } from '@/lib/api/job-checklist';
import { keys } from '@/lib/api/keys';
import type { ChecklistItemKey, ChecklistState } from '@/shared/schemas/job-checklist';
import { useMe } from './use-me';

/** The job's checklist, and a way to set one item (the jobs list's progress follows). */
export function useChecklist(jobId: string) {
  const { data: me } = useMe();
  const orgId = me?.activeOrgId ?? '';
  const { mutate } = useSWRConfig();
  const swr = useSWR(me ? keys.checklist(orgId, jobId) : null, () => fetchChecklist(jobId));
  const setItem = useCallback(
    async (key: ChecklistItemKey, patch: { state?: ChecklistState; note?: string }) => {
      const next = await updateChecklistItem(jobId, key, patch);
      await Promise.all([
        mutate(keys.checklist(orgId, jobId), next, { revalidate: false }),
        mutate(keys.jobProgress(orgId)),
      ]);
      return next;
    },
    [jobId, mutate, orgId],
  );
  return { ...swr, setItem };
}
