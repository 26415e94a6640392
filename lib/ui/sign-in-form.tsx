import { useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useSessionActions } from '@/lib/hooks/use-session-actions';
import { useSubmit } from '@/lib/hooks/use-submit';
import { spacing } from '@/lib/theme';
import { fieldErrors } from '@/shared/errors';
import { signInSchema } from '@/shared/schemas/auth';
import { Button } from './button';
import { mergeFieldErrors } from './form-errors';
import { FormProblem } from './form-problem';
import { safeNextPath } from './safe-next-path';
import { Text } from './text';
import { TextField } from './text-field';
import { TextLink } from './text-link';

/** E-mail and password. On success the session gate moves the person on. */
export function SignInForm() {
  const { signIn } = useSessionActions();
  const { run, busy, error } = useSubmit(signIn);
  const { next } = useLocalSearchParams<{ next?: string }>();
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const [clientErrors, setClientErrors] = useState<Record<string, string[]>>({});
  const errors = mergeFieldErrors(clientErrors, error);
  const nextPath = safeNextPath(next);

  const submit = () => {
    const parsed = signInSchema.safeParse({ email, password });
    setClientErrors(parsed.success ? {} : fieldErrors(parsed.error));
    if (parsed.success) void run(parsed.data);
  };

  return (
    <View style={styles.form}>
      <FormProblem error={error} />
      <TextField
        label="E-mail"
        testID="sign-in-email"
        value={email}
        onChangeText={setEmail}
        errors={errors.email}
        autoComplete="email"
        inputMode="email"
        autoCapitalize="none"
      />
      <TextField
        label="Password"
        testID="sign-in-password"
        value={password}
        onChangeText={setPassword}
        errors={errors.password}
        autoComplete="current-password"
        secureTextEntry
        onSubmitEditing={submit}
      />
      <Button label="Sign in" testID="sign-in-submit" busy={busy} onPress={submit} block />
      <View>
        <Text tone="muted">New to Tributary?</Text>
        <TextLink
          href={nextPath ? { pathname: '/sign-up', params: { next: nextPath } } : '/sign-up'}
          label="Create an account"
          testID="sign-in-to-sign-up"
        />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.lg },
});
