import { router } from 'expo-router';
import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { ApiError } from '@/lib/api/client';
import { reviseRequest } from '@/lib/api/design-requests';
import { useJob } from '@/lib/hooks/use-job';
import { spacing } from '@/lib/theme';
import type { RequestDetail } from '@/shared/schemas/requests/views';
import { Card } from '../card';
import { ErrorView } from '../error-view';
import { LoadingView } from '../loading-view';
import { Notice } from '../notice';
import { TextField } from '../text-field';
import { ComposeForm } from './compose-form';
import { draftFromCompose } from './compose-draft';
import { DraftPhotosCard } from './draft-photos-card';

/**
 * Revising a sent request: its working copy (fields, members, photos) edited and sent as the next version
 * in one step, with a note for the engineer; a Designed request reopens this way with a question. The sent
 * versions stay as they were; the engineer sees the list of what changed.
 */
export function RevisionEditor({
  request,
  onChange,
}: {
  request: RequestDetail;
  onChange: (detail: RequestDetail) => void;
}) {
  const job = useJob(request.jobId);
  const [note, setNote] = useState('');
  const [noteError, setNoteError] = useState<string[] | undefined>();
  const initial = useMemo(() => draftFromCompose(request.draft ?? undefined), [request.draft]);
  const reopening = request.actions.includes('reopen');
  const next = request.version + 1;
  if (job.error) return <ErrorView error={job.error} onRetry={() => void job.mutate()} />;
  if (!job.data) return <LoadingView />;
  return (
    <View style={styles.wrap}>
      <Notice tone="info" title={`Version ${request.version} stays as it was sent`} testID="revision-intro">
        {reopening
          ? `The engineer designed version ${request.version}. Change what you need and ask your question: it goes out as version ${next}, back in review, with the list of what changed.`
          : `Change what you need below. It goes out as version ${next}, and the engineer sees what changed from version ${request.version}, inputs and results side by side. Photos are added at once and go with version ${next}.`}
      </Notice>
      <DraftPhotosCard request={request} onChange={onChange} />
      <ComposeForm
        job={job.data}
        initial={initial}
        saveLabel={reopening ? `Reopen as version ${next}` : `Send version ${next} to the engineer`}
        beforeSave={
          <Card title={reopening ? 'Your question' : 'What changed'}>
            <TextField
              label={reopening ? 'Question for the engineer' : 'What changed, in your words'}
              hint={
                reopening
                  ? 'A Designed request reopens with a question.'
                  : 'The engineer reads it above the list of changes, like “the opening is 7 ft now”.'
              }
              value={note}
              onChangeText={setNote}
              errors={noteError}
              multiline
              testID="revision-note"
            />
          </Card>
        }
        onSave={async (body) => {
          setNoteError(undefined);
          try {
            const sent = await reviseRequest(request.id, {
              ...(reopening ? { question: note } : { note }),
              draft: body,
            });
            onChange(sent);
            router.replace({ pathname: '/requests/[requestId]', params: { requestId: request.id } });
          } catch (error) {
            if (error instanceof ApiError) setNoteError(error.fields.question ?? error.fields.note);
            throw error;
          }
        }}
      />
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { gap: spacing.lg } });
