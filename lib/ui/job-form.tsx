import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useSubmit } from '@/lib/hooks/use-submit';
import { spacing } from '@/lib/theme';
import { loadStandardEditions, type LoadStandard } from '@/shared/schemas/jobs';
import { Button } from './button';
import { Card } from './card';
import { ChoiceGroup, type Choice } from './choice-group';
import { mergeFieldErrors } from './form-errors';
import {
  draftToJobFields,
  type FoundationType,
  type JobDraft,
  type JobFields,
  type RoofType,
} from './job-draft';
import { foundationLabels, roofTypeLabels } from './job-labels';
import { FormProblem } from './form-problem';
import { Notice } from './notice';
import { TextField } from './text-field';

const choicesOf = <T extends string>(labels: Record<T, string>): Choice<T>[] =>
  (Object.keys(labels) as T[]).map((value) => ({ value, label: labels[value] }));
const roofChoices = choicesOf<RoofType>(roofTypeLabels);
const foundationChoices = choicesOf<FoundationType>(foundationLabels);
const standardChoices: Choice<LoadStandard>[] = loadStandardEditions.map((e) => ({ value: e, label: e }));

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
  const numeric = { keyboardType: 'numbers-and-punctuation', inputMode: 'decimal' } as const;

  const submit = () => {
    const result = draftToJobFields(draft);
    setClientErrors(result.ok ? {} : result.fields);
    if (result.ok) void run(result.value);
  };

  return (
    <View style={styles.form}>
      <Card title="The house">
        <TextField
          label="Job name"
          hint="What your crew calls it, e.g. “Miller kitchen wall”."
          testID="job-name"
          value={draft.name}
          onChangeText={set('name')}
          errors={errors.name}
        />
        <TextField
          label="Address"
          testID="job-address"
          value={draft.address}
          onChangeText={set('address')}
          errors={errors.address}
          autoComplete="street-address"
        />
        <TextField
          label="Year built"
          hint="Leave blank if not known."
          testID="job-year-built"
          value={draft.yearBuilt}
          onChangeText={set('yearBuilt')}
          errors={errors.yearBuilt}
          {...numeric}
          inputMode="numeric"
        />
        <TextField
          label="Stories"
          testID="job-stories"
          value={draft.stories}
          onChangeText={set('stories')}
          errors={errors.stories}
          {...numeric}
          inputMode="numeric"
        />
        <ChoiceGroup
          label="Foundation"
          testID="job-foundation"
          choices={foundationChoices}
          value={draft.foundation}
          onChange={set('foundation')}
          errors={errors.foundation}
        />
      </Card>
      <Card title="Roof">
        <ChoiceGroup
          label="Roof type"
          testID="job-roof-type"
          choices={roofChoices}
          value={draft.roofType}
          onChange={set('roofType')}
          errors={errors.roofType}
        />
        <TextField
          label="Roof slope"
          hint="Rise in inches per 12 in of run."
          unit="in 12"
          testID="job-roof-pitch"
          value={draft.roofPitchIn12}
          onChangeText={set('roofPitchIn12')}
          errors={errors.roofPitchIn12}
          {...numeric}
        />
        <TextField
          label="Building width"
          hint="Outside wall to outside wall, across the ridge. Blank if not measured yet."
          unit="ft"
          testID="job-building-width"
          value={draft.buildingWidthFt}
          onChangeText={set('buildingWidthFt')}
          errors={errors.buildingWidthFt}
          {...numeric}
        />
      </Card>
      <Card title="Snow and load standard">
        <ChoiceGroup
          label="Load standard edition"
          testID="job-load-standard"
          choices={standardChoices}
          value={draft.loadStandard}
          onChange={set('loadStandard')}
          errors={errors.loadStandard}
        />
        <TextField
          label="Ground snow load"
          hint="0 where the building department sets no snow load."
          unit="psf"
          testID="job-ground-snow"
          value={draft.groundSnowPsf}
          onChangeText={set('groundSnowPsf')}
          errors={errors.groundSnowPsf}
          {...numeric}
        />
        <TextField
          label="Where the ground snow value came from"
          hint="E.g. the building department’s design criteria sheet."
          testID="job-ground-snow-source"
          value={draft.groundSnowSource}
          onChangeText={set('groundSnowSource')}
          errors={errors.groundSnowSource}
        />
      </Card>
      <Card title="Notes">
        <TextField
          label="Notes"
          testID="job-notes"
          value={draft.notes}
          onChangeText={set('notes')}
          errors={errors.notes}
          multiline
        />
      </Card>
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
