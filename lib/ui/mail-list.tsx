import { ApiError } from '@/lib/api/client';
import { useDevMail } from '@/lib/hooks/use-dev-mail';
import { Card } from './card';
import { dateLabel } from './date-label';
import { EmptyState } from './empty-state';
import { ErrorView } from './error-view';
import { LinkedText } from './linked-text';
import { LoadingView } from './loading-view';
import { Notice } from './notice';
import { Text } from './text';

/** Mail the local fake SMTP server captured, newest first as the API gives it; `mailKey` opens it. */
export function MailList({ mailKey }: { mailKey: string }) {
  const { data: messages, error, mutate } = useDevMail(mailKey);

  if (error instanceof ApiError && error.status === 404) {
    return (
      <Notice tone="info" title="Not available here">
        Captured mail is kept only when the server runs for development or tests, and it opens only on the
        machine that runs the server, through the link (with its key) the server printed when it started.
      </Notice>
    );
  }
  if (error) return <ErrorView error={error} onRetry={() => mutate()} />;
  if (!messages) return <LoadingView />;
  if (messages.length === 0) {
    return (
      <EmptyState
        icon="mail"
        title="No mail yet"
        body="Invitations and other e-mails the server sends will show up here."
      />
    );
  }
  return messages.map((m) => (
    <Card key={m.id} title={m.subject} testID="mail-message">
      <Text variant="caption" tone="muted">{`To ${m.to} · ${dateLabel(m.createdAt)}`}</Text>
      <LinkedText>{m.text}</LinkedText>
    </Card>
  ));
}
