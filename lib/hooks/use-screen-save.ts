import { useRouter } from 'expo-router';
import { useCallback } from 'react';
import { useSWRConfig } from 'swr';
import { ApiError } from '@/lib/api/client';
import { keys } from '@/lib/api/keys';
import { cacheKey, queueWrite, withBaseVersion } from '@/lib/offline/queue-write';
import type { WizardSave } from '@/lib/ui/bearing/screen-wizard';
import { screenSchema, type ScreenWithHistory } from '@/shared/schemas/bearing-screens';
import { useMe } from './use-me';

/**
 * Saves a bearing screen (new, or a new version of `screen`) through the device's queue and opens its
 * outcome. Online, the job's screens, checklist and the jobs list's marks take the server's answer; with
 * no signal the device's own outcome shows until the server's replaces it.
 */
export function useScreenSave(jobId: string, screen?: ScreenWithHistory): WizardSave {
  const { data: me } = useMe();
  const { mutate } = useSWRConfig();
  const router = useRouter();
  return useCallback(
    async (wallLabel, answers, device) => {
      if (!me) return { ok: false, message: 'Sign in again to save.', fields: {} };
      const orgId = me.activeOrgId;
      const id = screen?.id ?? crypto.randomUUID();
      const now = new Date().toISOString();
      const local: ScreenWithHistory = {
        ...(screen ?? { createdBy: me.user.id, createdAt: now, history: [] }),
        id,
        jobId,
        wallLabel,
        answers,
        outcome: device.outcome,
        result: device,
        version: screen ? screen.version + 1 : 1,
        engineVersion: screen?.engineVersion ?? '',
        updatedBy: me.user.id,
        updatedByName: me.user.name,
        updatedAt: now,
      };
      try {
        const saved = await queueWrite(screenSchema, {
          key: crypto.randomUUID(),
          orgId,
          entity: 'screen',
          create: !screen,
          recordId: id,
          group: jobId,
          label: screen ? `Bearing screen ${wallLabel} answered again` : `New bearing screen ${wallLabel}`,
          method: screen ? 'PATCH' : 'POST',
          path: screen
            ? `/api/screens/${encodeURIComponent(id)}`
            : `/api/jobs/${encodeURIComponent(jobId)}/screens`,
          body: screen ? withBaseVersion({ wallLabel, answers }, screen) : { wallLabel, answers, id },
          localRecord: local,
          cache: {
            recordKey: cacheKey(keys.screen(orgId, id)),
            listKey: cacheKey(keys.jobScreens(orgId, jobId)),
            listField: 'screens',
          },
        });
        if (saved.state === 'sent')
          await Promise.all([mutate(keys.checklist(orgId, jobId)), mutate(keys.jobProgress(orgId))]);
        router.replace({
          pathname: '/jobs/[jobId]/screens/[screenId]',
          params: { jobId, screenId: saved.data?.id ?? id },
        });
        return { ok: true };
      } catch (error) {
        if (!(error instanceof ApiError)) throw error;
        return { ok: false, message: error.message, fields: error.fields };
      }
    },
    [jobId, screen, me, mutate, router],
  );
}
