import { router } from 'expo-router';
import { useMemo } from 'react';
import { StyleSheet, View } from 'react-native';
import { updateRequest } from '@/lib/api/design-requests';
import { useJob } from '@/lib/hooks/use-job';
import { spacing } from '@/lib/theme';
import type { RequestDetail } from '@/shared/schemas/requests/views';
import { ErrorView } from '../error-view';
import { LoadingView } from '../loading-view';
import { ComposeForm } from './compose-form';
import { draftFromCompose } from './compose-draft';
import { DraftPhotosCard } from './draft-photos-card';

/**
 * Editing a Draft not sent yet: its photos (added or removed at once) and its fields and members, saved
 * together as the working copy the send will freeze.
 */
export function DraftEditor({
  request,
  onChange,
}: {
  request: RequestDetail;
  onChange: (detail: RequestDetail) => void;
}) {
  const job = useJob(request.jobId);
  const initial = useMemo(() => draftFromCompose(request.draft ?? undefined), [request.draft]);
  if (job.error) return <ErrorView error={job.error} onRetry={() => void job.mutate()} />;
  if (!job.data) return <LoadingView />;
  return (
    <View style={styles.wrap}>
      <DraftPhotosCard request={request} onChange={onChange} />
      <ComposeForm
        job={job.data}
        initial={initial}
        saveLabel="Save the changes"
        onSave={async ({ engineerEmail, ...rest }) => {
          // An address, once given, can be changed but not taken back off a Draft.
          const saved = await updateRequest(request.id, engineerEmail ? { ...rest, engineerEmail } : rest);
          onChange(saved);
          router.replace({ pathname: '/requests/[requestId]', params: { requestId: request.id } });
        }}
      />
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { gap: spacing.lg } });
