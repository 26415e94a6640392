import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { postMessage } from '@/lib/api/design-requests';
import { spacing } from '@/lib/theme';
import type { RequestDetail } from '@/shared/schemas/requests/views';
import { Button } from '../button';
import { Card } from '../card';
import { dateLabel } from '../date-label';
import { Text } from '../text';
import { TextField } from '../text-field';

const EVENT_WORDS: Record<string, string> = {
  sent: 'Sent',
  revised: 'Revised (new version)',
  reopened: 'Reopened with a question (new version)',
  'in-review': 'Now In review',
  'needs-info': 'Now Needs info',
  designed: 'Now Designed',
  closed: 'Now Closed',
  declined: 'Declined',
  'fee-quoted': 'Fee quoted',
  'fee-accepted': 'Fee accepted',
  replied: 'Structured reply',
};

/** Messages both ways and the state changes, oldest first, with a box to write in. */
export function RequestThreadCard({
  request,
  onChange,
}: {
  request: RequestDetail;
  onChange: (detail: RequestDetail) => void;
}) {
  const [body, setBody] = useState('');
  const [busy, setBusy] = useState(false);
  const [problem, setProblem] = useState<string[]>([]);
  const canWrite = request.actions.includes('message');
  return (
    <Card title="Messages and changes" testID="request-thread">
      {request.thread.length === 0 ? <Text tone="muted">Nothing yet.</Text> : null}
      {request.thread.map((entry) => (
        <View
          key={entry.id}
          style={styles.entry}
          testID={entry.kind === 'message' ? 'thread-message' : 'thread-event'}
        >
          <Text variant="caption" tone="muted">
            {entry.authorName} ({entry.side === 'firm' ? 'contractor' : 'engineer'}) · v{entry.version} ·{' '}
            {dateLabel(entry.createdAt)}
          </Text>
          {entry.kind === 'event' ? (
            <Text variant="bodyStrong">{EVENT_WORDS[entry.event ?? ''] ?? entry.event}</Text>
          ) : null}
          {entry.body ? <Text>{entry.body}</Text> : null}
          {entry.files.map((file) => (
            <Text key={file.id} variant="caption">
              Attached: {file.fileName}
            </Text>
          ))}
        </View>
      ))}
      {canWrite ? (
        <View style={styles.entry}>
          <TextField
            label="Message"
            value={body}
            onChangeText={setBody}
            multiline
            errors={problem}
            testID="message-body"
          />
          <Button
            label="Send message"
            icon="mail"
            busy={busy}
            testID="message-send"
            onPress={async () => {
              setBusy(true);
              try {
                onChange(await postMessage(request.id, { body }));
                setBody('');
                setProblem([]);
              } catch (error) {
                setProblem([error instanceof Error ? error.message : 'The message was not sent']);
              } finally {
                setBusy(false);
              }
            }}
          />
        </View>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({ entry: { gap: spacing.xxs, paddingTop: spacing.md } });
