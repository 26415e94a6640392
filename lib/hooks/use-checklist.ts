import { useCallback } from 'react';
import useSWR, { useSWRConfig } from 'swr';
import { fetchChecklist, updateChecklistItem, updateEngineerItem } from '@/lib/api/job-checklist';
import { keys } from '@/lib/api/keys';
import type {
  Checklist,
  ChecklistItemKey,
  ChecklistState,
  EngineerItemPatch,
} from '@/shared/schemas/job-checklist';
import { useMe } from './use-me';

/** The job's checklist, and ways to set one item or one of the engineer's (the jobs list's progress follows). */
export function useChecklist(jobId: string) {
  const { data: me } = useMe();
  const orgId = me?.activeOrgId ?? '';
  const { mutate } = useSWRConfig();
  const swr = useSWR(me ? keys.checklist(orgId, jobId) : null, () => fetchChecklist(jobId));
  const settle = useCallback(
    async (next: Checklist) => {
      await Promise.all([
        mutate(keys.checklist(orgId, jobId), next, { revalidate: false }),
        mutate(keys.jobProgress(orgId)),
      ]);
      return next;
    },
    [jobId, mutate, orgId],
  );
  const setItem = useCallback(
    async (key: ChecklistItemKey, patch: { state?: ChecklistState; note?: string }) =>
      settle(await updateChecklistItem(jobId, key, patch)),
    [jobId, settle],
  );
  const setEngineerItem = useCallback(
    async (itemId: string, patch: EngineerItemPatch) =>
      settle(await updateEngineerItem(jobId, itemId, patch)),
    [jobId, settle],
  );
  return { ...swr, setItem, setEngineerItem };
}
