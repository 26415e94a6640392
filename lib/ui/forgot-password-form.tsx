import { useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { requestPasswordReset } from '@/lib/api/auth';
import { useFormSubmit } from '@/lib/hooks/use-form-submit';
import { spacing } from '@/lib/theme';
import { passwordResetRequestSchema } from '@/shared/schemas/auth';
import { Button } from './button';
import { FormProblem } from './form-problem';
import { Notice } from './notice';
import { TextField } from './text-field';
import { TextLink } from './text-link';

/**
 * Asks for the e-mail address and mails a reset link. The answer reads the same whether or not the address
 * has an account, so the page tells nobody who uses Tributary.
 */
export function ForgotPasswordForm() {
  const params = useLocalSearchParams<{ email?: string }>();
  const [email, setEmail] = useState(typeof params.email === 'string' ? params.email : '');
  const [sentTo, setSentTo] = useState<string | null>(null);
  const { submit: submitForm, busy, error, errors } = useFormSubmit(requestPasswordReset);

  const submit = async () => {
    const result = await submitForm(passwordResetRequestSchema, { email });
    if (result?.ok) setSentTo(email.trim());
  };

  if (sentTo) {
    return (
      <View style={styles.form}>
        <Notice tone="success" title="Check your e-mail" testID="reset-requested">
          {`If an account uses ${sentTo}, a link to set a new password is on its way there. The link works once, for an hour; asking again makes the older link stop working.`}
        </Notice>
        <Button label="Send again" variant="secondary" busy={busy} onPress={() => void submit()} />
        <TextLink href="/sign-in" label="Back to sign-in" />
      </View>
    );
  }

  return (
    <View style={styles.form}>
      <FormProblem error={error} />
      <TextField
        label="E-mail"
        hint="The address you sign in with. We mail it a link to set a new password."
        testID="forgot-email"
        value={email}
        onChangeText={setEmail}
        errors={errors.email}
        autoComplete="email"
        inputMode="email"
        autoCapitalize="none"
        onSubmitEditing={() => void submit()}
      />
      <Button
        label="Send reset link"
        testID="forgot-submit"
        busy={busy}
        onPress={() => void submit()}
        block
      />
      <TextLink href="/sign-in" label="Back to sign-in" />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: spacing.lg } });
