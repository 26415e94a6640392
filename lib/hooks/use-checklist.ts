import { useCallback } from 'react';
import useSWR from 'swr';
import { useSWRConfig } from 'swr';
import { fetchChecklist, updateEngineerItem } from '@/lib/api/job-checklist';
import { keys } from '@/lib/api/keys';
import { cacheKey, nextVersion, queueWrite, withBaseVersion } from '@/lib/offline/queue-write';
import {
  checklistSchema,
  type Checklist,
  type ChecklistItemKey,
  type ChecklistState,
  type EngineerItemPatch,
} from '@/shared/schemas/job-checklist';
import { useMe } from './use-me';

type Patch = { state?: ChecklistState; note?: string };

/** The checklist with one item changed on the device, its progress counted again. */
function patched(
  checklist: Checklist,
  key: ChecklistItemKey,
  patch: Patch,
  by: { id: string; name: string },
) {
  const items = checklist.items.map((item) =>
    item.key === key
      ? nextVersion({
          ...item,
          ...patch,
          updatedBy: by.id,
          updatedByName: by.name,
          updatedAt: new Date().toISOString(),
        })
      : item,
  );
  const all = [...items, ...checklist.engineerItems];
  const count = (state: ChecklistState) => all.filter((i) => i.state === state).length;
  return {
    ...checklist,
    items,
    progress: {
      done: count('done'),
      notNeeded: count('not-needed'),
      toDo: count('to-do'),
      total: all.length,
    },
  };
}

/**
 * The job's checklist, and a way to set one item through the device's queue (the jobs list's progress
 * follows once the server has it). The engineer's items are set straight on the server: their photos are
 * files of the request, uploaded first.
 */
export function useChecklist(jobId: string) {
  const { data: me } = useMe();
  const orgId = me?.activeOrgId ?? '';
  const { mutate } = useSWRConfig();
  const swr = useSWR(me ? keys.checklist(orgId, jobId) : null, () => fetchChecklist(jobId));
  const current = swr.data;
  const setItem = useCallback(
    async (key: ChecklistItemKey, patch: Patch) => {
      if (!me || !current) throw new Error('The checklist is not loaded yet');
      const recordKey = cacheKey(keys.checklist(orgId, jobId));
      let local: Checklist = current;
      // Built inside the queue's lock from the device's newest copy, so a quick second tap bases on the first.
      const saved = await queueWrite(checklistSchema, async (latest) => {
        const parsed = checklistSchema.safeParse(await latest(recordKey));
        const newest = parsed.success ? parsed.data : current;
        const item = newest.items.find((i) => i.key === key);
        local = patched(newest, key, patch, me.user);
        return {
          key: crypto.randomUUID(),
          orgId,
          entity: 'checklist',
          create: false,
          recordId: `${jobId}:${key}`,
          group: jobId,
          label: `Checklist: ${item?.title ?? key}`,
          method: 'PATCH',
          path: `/api/jobs/${encodeURIComponent(jobId)}/checklist/${encodeURIComponent(key)}`,
          body: withBaseVersion(patch, item),
          localRecord: local,
          cache: { recordKey },
        };
      });
      if (saved.state === 'sent') await mutate(keys.jobProgress(orgId));
      return saved.data ?? local;
    },
    [current, jobId, me, mutate, orgId],
  );
  const setEngineerItem = useCallback(
    async (itemId: string, patch: EngineerItemPatch) => {
      const next = await updateEngineerItem(jobId, itemId, patch);
      await Promise.all([
        mutate(keys.checklist(orgId, jobId), next, { revalidate: false }),
        mutate(keys.jobProgress(orgId)),
      ]);
      return next;
    },
    [jobId, mutate, orgId],
  );
  return { ...swr, setItem, setEngineerItem };
}
