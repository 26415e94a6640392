import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { ApiError } from '@/lib/api/client';
import { useMe } from '@/lib/hooks/use-me';
import { useFormSubmit } from '@/lib/hooks/use-form-submit';
import { useSessionActions } from '@/lib/hooks/use-session-actions';
import { useSubmit } from '@/lib/hooks/use-submit';
import { spacing } from '@/lib/theme';
import { PASSWORD_RULE } from '@/shared/schemas/auth';
import {
  acceptInvitationSchema,
  type AcceptInvitationInput,
  type InvitationPreview,
} from '@/shared/schemas/orgs';
import { Button } from './button';
import { LinkButton } from './link-button';
import { LoadingView } from './loading-view';
import { FormProblem } from './form-problem';
import { Notice } from './notice';
import { Text } from './text';
import { TextField } from './text-field';

type Props = { token: string; preview: InvitationPreview };

/** The action that fits who is looking: a new person sets a name and password; an existing one accepts. */
export function AcceptInvitation({ token, preview }: Props) {
  const { data: me, error: meError } = useMe();
  const actions = useSessionActions();
  const accept = useFormSubmit((input: AcceptInvitationInput) => actions.acceptInvitation(token, input));
  const leave = useSubmit(actions.signOut);
  const [name, setName] = useState('');
  const [password, setPassword] = useState('');
  const { errors } = accept;
  const here = `/invite/${token}`;
  const signedOut = meError instanceof ApiError && meError.status === 401;

  if (!me && !meError) return <LoadingView />;

  if (me && me.user.email === preview.email) {
    return (
      <View style={styles.form}>
        {accept.error ? <Notice tone="error">{accept.error.message}</Notice> : null}
        <Text>{`You are signed in as ${me.user.email}.`}</Text>
        <Button
          label={`Join ${preview.orgName}`}
          testID="invite-accept"
          busy={accept.busy}
          onPress={() => void accept.submit(acceptInvitationSchema, {})}
          block
        />
      </View>
    );
  }

  if (me) {
    return (
      <View style={styles.form}>
        <Notice tone="warning" title="Signed in as someone else">
          {`You are signed in as ${me.user.email}, but this invitation is for ${preview.email}. Sign out, then open the link again.`}
        </Notice>
        <Button label="Sign out" variant="secondary" busy={leave.busy} onPress={() => void leave.run(here)} />
      </View>
    );
  }

  if (preview.hasAccount || !signedOut) {
    return (
      <View style={styles.form}>
        <Text>{`${preview.email} already has a Tributary account. Sign in with it to accept.`}</Text>
        <LinkButton
          href={{ pathname: '/sign-in', params: { next: here } }}
          label="Sign in to accept"
          testID="invite-sign-in"
          block
        />
      </View>
    );
  }

  const submit = () => void accept.submit(acceptInvitationSchema.required(), { name, password });

  return (
    <View style={styles.form}>
      <FormProblem error={accept.error} />
      <TextField
        label="E-mail"
        value={preview.email}
        editable={false}
        hint="The invitation is for this address."
      />
      <TextField
        label="Your name"
        testID="invite-name"
        value={name}
        onChangeText={setName}
        errors={errors.name}
        autoComplete="name"
      />
      <TextField
        label="Choose a password"
        hint={PASSWORD_RULE}
        testID="invite-password"
        value={password}
        onChangeText={setPassword}
        errors={errors.password}
        autoComplete="new-password"
        secureTextEntry
        onSubmitEditing={submit}
      />
      <Button
        label={`Join ${preview.orgName}`}
        testID="invite-accept"
        busy={accept.busy}
        onPress={submit}
        block
      />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: spacing.lg } });
