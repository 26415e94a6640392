import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useFormSubmit } from '@/lib/hooks/use-form-submit';
import { spacing } from '@/lib/theme';
import {
  createInvitationSchema,
  type CreateInvitationInput,
  type InvitationRow,
} from '@/shared/schemas/orgs';
import { Button } from './button';
import { ChoiceGroup, type Choice } from './choice-group';
import { FormProblem } from './form-problem';
import { Notice } from './notice';
import { TextField } from './text-field';

type InvitableRole = CreateInvitationInput['role'];

const roleChoices: Choice<InvitableRole>[] = [
  {
    value: 'contractor',
    label: 'Contractor',
    description: 'Field lead: jobs, wall screens, checks, framing lists, design requests.',
  },
  {
    value: 'estimator',
    label: 'Estimator',
    description: 'Everything a contractor sees, plus the price book and budgets.',
  },
  { value: 'owner', label: 'Owner', description: 'Everything, including members and invitations.' },
];

/** E-mail and role; the invitee gets a link by e-mail. */
export function InviteForm({
  onInvite,
}: {
  onInvite: (input: CreateInvitationInput) => Promise<InvitationRow>;
}) {
  const [email, setEmail] = useState('');
  const [role, setRole] = useState<InvitableRole>('contractor');
  const [sentTo, setSentTo] = useState<string | null>(null);
  const { submit: submitForm, busy, error, errors } = useFormSubmit(onInvite);

  const submit = async () => {
    setSentTo(null);
    const result = await submitForm(createInvitationSchema, { email, role });
    if (result?.ok) {
      setSentTo(result.value.email);
      setEmail('');
    }
  };

  return (
    <View style={styles.form}>
      {sentTo ? (
        <Notice tone="success" title="Invitation sent">{`An invitation e-mail went to ${sentTo}.`}</Notice>
      ) : null}
      <FormProblem error={error} />
      <TextField
        label="E-mail"
        testID="invite-email"
        value={email}
        onChangeText={setEmail}
        errors={errors.email}
        inputMode="email"
        autoCapitalize="none"
      />
      <ChoiceGroup
        label="Role"
        testID="invite-role"
        choices={roleChoices}
        value={role}
        onChange={setRole}
        errors={errors.role}
      />
      <Button
        label="Send invitation"
        icon="mail"
        testID="invite-submit"
        busy={busy}
        onPress={() => void submit()}
      />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: spacing.lg } });
