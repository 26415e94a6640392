import { useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useSessionActions } from '@/lib/hooks/use-session-actions';
import { useFormSubmit } from '@/lib/hooks/use-form-submit';
import { spacing } from '@/lib/theme';
import { signInSchema } from '@/shared/schemas/auth';
import { Button } from './button';
import { FormProblem } from './form-problem';
import { safeNextPath } from './safe-next-path';
import { Text } from './text';
import { TextField } from './text-field';
import { TextLink } from './text-link';

/** E-mail and password. On success the session gate moves the person on. */
export function SignInForm() {
  const { signIn } = useSessionActions();
  const { submit: submitForm, busy, error, errors } = useFormSubmit(signIn);
  const { next } = useLocalSearchParams<{ next?: string }>();
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const nextPath = safeNextPath(next);

  const submit = () => void submitForm(signInSchema, { email, password });

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
      <TextLink
        href={{ pathname: '/forgot-password', params: email.trim() ? { email: email.trim() } : {} }}
        label="Forgot your password?"
        testID="sign-in-forgot"
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
