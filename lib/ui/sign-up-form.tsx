import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useSessionActions } from '@/lib/hooks/use-session-actions';
import { useFormSubmit } from '@/lib/hooks/use-form-submit';
import { spacing } from '@/lib/theme';
import { PASSWORD_RULE, signUpSchema, type OrgKind } from '@/shared/schemas/auth';
import { Button } from './button';
import { ChoiceGroup, type Choice } from './choice-group';
import { FormProblem } from './form-problem';
import { Text } from './text';
import { TextField } from './text-field';
import { TextLink } from './text-link';

const firmKinds: Choice<OrgKind>[] = [
  {
    value: 'contracting',
    label: 'Contracting firm',
    description: 'Remodelers, framers and estimators. You become the firm’s owner and can invite your crew.',
  },
  {
    value: 'engineering',
    label: 'Engineering firm',
    description: 'Licensed engineers. You receive the design requests contractors send you.',
  },
];

/** Creates a person and their firm; the session gate moves them on once signed in. */
export function SignUpForm() {
  const { signUp } = useSessionActions();
  const { submit: submitForm, busy, error, errors } = useFormSubmit(signUp);
  const [name, setName] = useState('');
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const [firmName, setFirmName] = useState('');
  const [firmKind, setFirmKind] = useState<OrgKind>('contracting');

  const submit = () => void submitForm(signUpSchema, { name, email, password, firmName, firmKind });

  return (
    <View style={styles.form}>
      <FormProblem error={error} />
      <TextField
        label="Your name"
        testID="sign-up-name"
        value={name}
        onChangeText={setName}
        errors={errors.name}
        autoComplete="name"
      />
      <TextField
        label="E-mail"
        testID="sign-up-email"
        value={email}
        onChangeText={setEmail}
        errors={errors.email}
        autoComplete="email"
        inputMode="email"
        autoCapitalize="none"
      />
      <TextField
        label="Password"
        hint={PASSWORD_RULE}
        testID="sign-up-password"
        value={password}
        onChangeText={setPassword}
        errors={errors.password}
        autoComplete="new-password"
        secureTextEntry
      />
      <TextField
        label="Firm name"
        testID="sign-up-firm-name"
        value={firmName}
        onChangeText={setFirmName}
        errors={errors.firmName}
        autoComplete="organization"
      />
      <ChoiceGroup
        label="Kind of firm"
        testID="sign-up-firm-kind"
        choices={firmKinds}
        value={firmKind}
        onChange={setFirmKind}
        errors={errors.firmKind}
      />
      <Button label="Create account" testID="sign-up-submit" busy={busy} onPress={submit} block />
      <View>
        <Text tone="muted">Already have an account?</Text>
        <TextLink href="/sign-in" label="Sign in" testID="sign-up-to-sign-in" />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: spacing.lg } });
