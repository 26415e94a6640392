import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useSubmit } from '@/lib/hooks/use-submit';
import { spacing } from '@/lib/theme';
import { Button } from './button';
import { mergeFieldErrors } from './form-errors';
import { FormProblem } from './form-problem';
import { draftToJobFields, type JobDraft, type JobFields } from './job-draft';
import { JobFormFields } from './job-form-fields';
import { Notice } from './notice';

type JobFormProps = {
  initial: JobDraft;
  submitLabel: string;
  /** Saves the checked fields; an ApiError it throws is shown on the form. */
  onSubmit: (fields: JobFields) => Promise<unknown>;
  onCancel?: () => void;
};

/** Create or edit a job. Numbers accept fractions ("6 1/2"); messages sit under each field. */
export function JobForm({ initial, submitLabel, onSubmit, onCancel }: JobFormProps) {
  const [draft, setDraft] = useState(initial);
  const [clientErrors, setClientErrors] = useState<Record<string, string[]>>({});
  const { run, busy, error } = useSubmit(onSubmit);
  const errors = mergeFieldErrors(clientErrors, error);
  const set =
    <K extends keyof JobDraft>(key: K) =>
    (value: JobDraft[K]) =>
      setDraft((d) => ({ ...d, [key]: value }));

  const submit = () => {
    const result = draftToJobFields(draft);
    setClientErrors(result.ok ? {} : result.fields);
    if (result.ok) void run(result.value);
  };

  return (
    <View style={styles.form}>
      <JobFormFields draft={draft} set={set} errors={errors} />
      <FormProblem error={error} fieldsAre="above" />
      {Object.keys(clientErrors).length ? (
        <Notice tone="error">Some fields need another look; see the messages above.</Notice>
      ) : null}
      <View style={styles.actions}>
        <Button label={submitLabel} testID="job-submit" busy={busy} onPress={submit} />
        {onCancel ? <Button label="Cancel" variant="secondary" onPress={onCancel} /> : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.lg },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
});
