import { useCallback } from 'react';
import { useSWRConfig } from 'swr';
import { keys } from '@/lib/api/keys';
import { cacheKey, queueWrite, withBaseVersion } from '@/lib/offline/queue-write';
import {
  shoringAnswerSchema,
  type ShoringPlanBodyInput,
  type ShoringRecord,
} from '@/shared/schemas/shoring-plans';
import { useMe } from './use-me';

/** The server's plan, or null while the plan waits on the device (the server works it out when it arrives). */
export type ShoringSaved = ShoringRecord | null;

/**
 * Saves a member's shoring plan through the device's queue (in the job's order, after the member itself).
 * The plan's result comes from the server, which computes it from the member's saved loads.
 */
export function useShoringSave(jobId: string, memberId: string, saved: ShoringRecord | null) {
  const { data: me } = useMe();
  const { mutate } = useSWRConfig();
  return useCallback(
    async (body: ShoringPlanBodyInput): Promise<ShoringSaved> => {
      if (!me) throw new Error('Sign in again to save.');
      const orgId = me.activeOrgId;
      const result = await queueWrite(shoringAnswerSchema, {
        key: crypto.randomUUID(),
        orgId,
        entity: 'shoring',
        create: !saved,
        recordId: saved?.id ?? `shoring:${memberId}`,
        group: jobId,
        label: saved ? 'Shoring plan changed' : 'New shoring plan',
        method: 'PUT',
        path: `/api/members/${encodeURIComponent(memberId)}/shoring`,
        body: saved ? withBaseVersion(body, saved) : { ...body, id: crypto.randomUUID() },
        cache: { recordKey: cacheKey(keys.shoring(orgId, memberId)) },
      });
      if (result.state !== 'sent') return null;
      await mutate(keys.shoring(orgId, memberId), result.data.shoring, { revalidate: false });
      return result.data.shoring;
    },
    [jobId, me, memberId, mutate, saved],
  );
}
