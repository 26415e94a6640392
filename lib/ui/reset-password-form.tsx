import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useFormSubmit } from '@/lib/hooks/use-form-submit';
import { useSessionActions } from '@/lib/hooks/use-session-actions';
import { spacing } from '@/lib/theme';
import { PASSWORD_RULE, passwordResetSchema } from '@/shared/schemas/auth';
import { Button } from './button';
import { FormProblem } from './form-problem';
import { Text } from './text';
import { TextField } from './text-field';
import { TextLink } from './text-link';

/**
 * The page a reset e-mail links to: a new password under the rule, then the person is signed in here and
 * signed out everywhere else.
 */
export function ResetPasswordForm({ token }: { token: string }) {
  const actions = useSessionActions();
  const {
    submit: submitForm,
    busy,
    error,
    errors,
  } = useFormSubmit((input: { password: string }) => actions.resetPassword(token, input));
  const [password, setPassword] = useState('');
  const submit = () => void submitForm(passwordResetSchema, { password });

  return (
    <View style={styles.form}>
      <FormProblem error={error} />
      <Text tone="muted">Setting it signs you out of every other browser.</Text>
      <TextField
        label="New password"
        hint={PASSWORD_RULE}
        testID="reset-password"
        value={password}
        onChangeText={setPassword}
        errors={errors.password}
        autoComplete="new-password"
        secureTextEntry
        onSubmitEditing={submit}
      />
      <Button label="Set password and sign in" testID="reset-submit" busy={busy} onPress={submit} block />
      <TextLink href="/forgot-password" label="Ask for a new link" testID="reset-new-link" />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: spacing.lg } });
