import { useInvitation } from '@/lib/hooks/use-invitation';
import { AcceptInvitation } from './accept-invitation';
import { AuthFrame } from './auth-frame';
import { dateLabel } from './date-label';
import { ErrorView } from './error-view';
import { FieldList } from './field-list';
import { LoadingView } from './loading-view';
import { roleLabel } from './role-label';
import { Text } from './text';
import { TextLink } from './text-link';

/** The page an invitation e-mail links to: who invited whom, into which firm, and how to accept. */
export function InvitationView({ token }: { token: string }) {
  const { data: preview, error, mutate } = useInvitation(token);

  if (error) {
    return (
      <AuthFrame title="Invitation">
        <ErrorView error={error} onRetry={() => mutate()} />
        <Text tone="muted">Ask the person who invited you to send a new invitation.</Text>
        <TextLink href="/sign-in" label="Go to sign-in" />
      </AuthFrame>
    );
  }
  if (!preview) return <LoadingView />;

  return (
    <AuthFrame title={`Join ${preview.orgName}`}>
      <Text>{`${preview.invitedBy} invited you to join ${preview.orgName} on Tributary as ${roleLabel(preview.role).toLowerCase()}.`}</Text>
      <FieldList
        items={[
          { label: 'Firm', value: preview.orgName },
          { label: 'Role', value: roleLabel(preview.role) },
          { label: 'Invited by', value: preview.invitedBy },
          { label: 'For', value: preview.email },
          { label: 'Link expires', value: dateLabel(preview.expiresAt) },
        ]}
      />
      <AcceptInvitation token={token} preview={preview} />
    </AuthFrame>
  );
}
