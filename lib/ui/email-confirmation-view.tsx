import { ApiError } from '@/lib/api/client';
import { useEmailConfirmation } from '@/lib/hooks/use-email-confirmation';
import { useMe } from '@/lib/hooks/use-me';
import { AuthFrame } from './auth-frame';
import { ErrorView } from './error-view';
import { LinkButton } from './link-button';
import { LoadingView } from './loading-view';
import { Notice } from './notice';
import { ResendConfirmation } from './resend-confirmation';
import { Text } from './text';
import { TextLink } from './text-link';

/** What to do after a spent or expired link depends on who is looking. */
function NextStep() {
  const { data: me, error } = useMe();
  if (me?.user.emailVerified) {
    return <Text>{`${me.user.email} is confirmed already: nothing more to do.`}</Text>;
  }
  if (me) return <ResendConfirmation email={me.user.email} />;
  if (error instanceof ApiError && error.status === 401) {
    return (
      <>
        <Text tone="muted">Sign in, then ask for a new link from the notice at the top of the page.</Text>
        <TextLink href="/sign-in" label="Go to sign-in" />
      </>
    );
  }
  return null;
}

/** The page a confirmation e-mail links to: confirms the address at once and says so. */
export function EmailConfirmationView({ token }: { token: string }) {
  const confirmation = useEmailConfirmation(token);

  if (confirmation.state === 'working') {
    return (
      <AuthFrame title="Confirm your e-mail">
        <LoadingView label="Confirming…" />
      </AuthFrame>
    );
  }
  if (confirmation.state === 'failed') {
    return (
      <AuthFrame title="Confirm your e-mail">
        <ErrorView error={confirmation.error} />
        <NextStep />
      </AuthFrame>
    );
  }
  return (
    <AuthFrame title="E-mail confirmed">
      <Notice tone="success" title="Your e-mail address is confirmed" testID="email-confirmed">
        Nothing in Tributary waits on it any more.
      </Notice>
      <LinkButton href="/" label="Continue to Tributary" testID="email-confirmed-continue" block />
    </AuthFrame>
  );
}
