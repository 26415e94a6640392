import { useRouter } from 'expo-router';
import { useCallback } from 'react';
import { useSWRConfig } from 'swr';
import { createScreen, updateScreen } from '@/lib/api/bearing-screens';
import { ApiError } from '@/lib/api/client';
import { keys } from '@/lib/api/keys';
import type { WizardSave } from '@/lib/ui/bearing/screen-wizard';
import { useMe } from './use-me';

/**
 * Saves a bearing screen (new, or a new version of `screenId`) and opens its outcome. The job's screens,
 * checklist and the jobs list's marks take the server's answer.
 */
export function useScreenSave(jobId: string, screenId?: string): WizardSave {
  const { data: me } = useMe();
  const { mutate } = useSWRConfig();
  const router = useRouter();
  const orgId = me?.activeOrgId ?? '';
  return useCallback(
    async (wallLabel, answers) => {
      try {
        const screen = screenId
          ? await updateScreen(screenId, { wallLabel, answers })
          : await createScreen(jobId, { wallLabel, answers });
        await Promise.all([
          mutate(keys.screen(orgId, screen.id)),
          mutate(keys.jobScreens(orgId, jobId)),
          mutate(keys.checklist(orgId, jobId)),
          mutate(keys.jobProgress(orgId)),
        ]);
        router.replace({
          pathname: '/jobs/[jobId]/screens/[screenId]',
          params: { jobId, screenId: screen.id },
        });
        return { ok: true };
      } catch (error) {
        if (!(error instanceof ApiError)) throw error;
        return { ok: false, message: error.message, fields: error.fields };
      }
    },
    [jobId, screenId, mutate, orgId, router],
  );
}
