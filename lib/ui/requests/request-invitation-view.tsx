import { useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import useSWR, { useSWRConfig } from 'swr';
import { setActiveOrgId } from '@/lib/api/active-org';
import { acceptRequestInvitation, fetchRequestInvitation } from '@/lib/api/design-requests';
import { isFirmScopedKey } from '@/lib/api/keys';
import { useMe } from '@/lib/hooks/use-me';
import { spacing } from '@/lib/theme';
import { AuthFrame } from '../auth-frame';
import { Button } from '../button';
import { ErrorView } from '../error-view';
import { LinkButton } from '../link-button';
import { LoadingView } from '../loading-view';
import { Notice } from '../notice';
import { Text } from '../text';
import { TextField } from '../text-field';

/**
 * The link mailed to an engineer without a bound account: a new engineer makes an account (and their
 * firm) here; one with an account signs in as the addressed e-mail and opens the request. Either binds it.
 */
export function RequestInvitationView({ token }: { token: string }) {
  const router = useRouter();
  const { mutate } = useSWRConfig();
  const { data: me } = useMe();
  const preview = useSWR(['request-invitation', token], () => fetchRequestInvitation(token));
  const [form, setForm] = useState({ name: '', password: '', firmName: '' });
  const [fields, setFields] = useState<Record<string, string[]>>({});
  const [problem, setProblem] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function accept(body: typeof form | Record<string, never>) {
    setBusy(true);
    setProblem(null);
    try {
      const result = await acceptRequestInvitation(token, body);
      setActiveOrgId(result.me.activeOrgId);
      await mutate(isFirmScopedKey, undefined);
      router.replace({ pathname: '/requests/[requestId]', params: { requestId: result.requestId } });
    } catch (error) {
      setProblem(error instanceof Error ? error.message : 'That did not work');
      setFields(
        error && typeof error === 'object' && 'fields' in error
          ? (error.fields as Record<string, string[]>)
          : {},
      );
    } finally {
      setBusy(false);
    }
  }

  if (preview.error)
    return (
      <AuthFrame title="Design request">
        <ErrorView error={preview.error} onRetry={() => preview.mutate()} />
      </AuthFrame>
    );
  if (!preview.data) return <LoadingView />;
  const p = preview.data;
  const here = `/request-invite/${token}`;
  return (
    <AuthFrame title={`Design request ${p.number} from ${p.firmName}`}>
      <View style={styles.form}>
        <Text>{`${p.jobName}, sent to ${p.email}.`}</Text>
        {problem ? <Notice tone="error">{problem}</Notice> : null}
        {me && me.user.email === p.email ? (
          <Button
            label="Open the request"
            busy={busy}
            testID="request-invite-open"
            onPress={() => void accept({})}
            block
          />
        ) : me ? (
          <Notice tone="warning" title="Signed in as someone else">
            {`You are signed in as ${me.user.email}; this request is for ${p.email}. Sign out, then open the link again.`}
          </Notice>
        ) : p.hasAccount ? (
          <LinkButton
            href={{ pathname: '/sign-in', params: { next: here } }}
            label="Sign in to open it"
            block
          />
        ) : (
          <>
            <TextField
              label="Your name"
              value={form.name}
              onChangeText={(name) => setForm({ ...form, name })}
              errors={fields.name}
              testID="request-invite-name"
            />
            <TextField
              label="Your firm"
              value={form.firmName}
              onChangeText={(firmName) => setForm({ ...form, firmName })}
              errors={fields.firmName}
              testID="request-invite-firm"
            />
            <TextField
              label="Password"
              value={form.password}
              onChangeText={(password) => setForm({ ...form, password })}
              errors={fields.password}
              secureTextEntry
              testID="request-invite-password"
            />
            <Button
              label="Make my account and open the request"
              busy={busy}
              testID="request-invite-accept"
              onPress={() => void accept(form)}
              block
            />
          </>
        )}
      </View>
    </AuthFrame>
  );
}

const styles = StyleSheet.create({ form: { gap: spacing.md } });
