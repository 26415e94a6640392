import { router } from 'expo-router';
import { useMemo } from 'react';
import { createRequest } from '@/lib/api/design-requests';
import type { ScreenWithHistory } from '@/shared/schemas/bearing-screens';
import type { Job } from '@/shared/schemas/jobs';
import { Notice } from '../notice';
import { Text } from '../text';
import { ComposeForm } from './compose-form';
import { draftFromCompose } from './compose-draft';
import { composeFromScreen } from './request-from-screen';

/**
 * A new design request from the job, saved as a Draft; started from an "engineer required" bearing screen
 * it already holds the screen's reasons. Photos are added and the request sent from its own page.
 */
export function NewRequestForm({ job, fromScreen }: { job: Job; fromScreen?: ScreenWithHistory }) {
  const initial = useMemo(
    () => draftFromCompose(fromScreen ? composeFromScreen(fromScreen) : undefined),
    [fromScreen],
  );
  return (
    <ComposeForm
      job={job}
      initial={initial}
      saveLabel="Save the draft"
      intro={
        fromScreen ? (
          <Notice
            tone="info"
            title={`From the bearing screen of ${fromScreen.wallLabel}`}
            testID="compose-from-screen"
          >
            <Text>
              The screen’s reasons for an engineer are in “Bearing points” below, each marked seen or assumed.
              Add what else you know and save the draft.
            </Text>
          </Notice>
        ) : undefined
      }
      onSave={async (body) => {
        const request = await createRequest(job.id, body);
        router.replace({ pathname: '/requests/[requestId]', params: { requestId: request.id } });
      }}
    />
  );
}
