import {
  adoptedCodes,
  asceEditionForCode,
  loadStandardEditions,
  type AdoptedCode,
  type LoadStandard,
} from '@/shared/schemas/jobs';
import { Card } from './card';
import { ChoiceGroup, type Choice } from './choice-group';
import type { FoundationType, JobDraft, RoofType } from './job-draft';
import { foundationLabels, roofTypeLabels } from './job-labels';
import { Text } from './text';
import { TextField } from './text-field';

const choicesOf = <T extends string>(labels: Record<T, string>): Choice<T>[] =>
  (Object.keys(labels) as T[]).map((value) => ({ value, label: labels[value] }));
const roofChoices = choicesOf<RoofType>(roofTypeLabels);
const foundationChoices = choicesOf<FoundationType>(foundationLabels);
const standardChoices: Choice<LoadStandard>[] = loadStandardEditions.map((e) => ({ value: e, label: e }));
type CodeChoice = AdoptedCode | 'unknown';
const codeChoices: Choice<CodeChoice>[] = [
  ...adoptedCodes.map((code) => ({ value: code as CodeChoice, label: code })),
  { value: 'unknown', label: 'Not known' },
];

/** A text keyboard with digits, space and "/" at hand, so "6 1/2" can be typed. */
const fractionKeyboard = { keyboardType: 'numbers-and-punctuation' } as const;
const wholeNumberKeyboard = { keyboardType: 'number-pad', inputMode: 'numeric' } as const;

type JobFormFieldsProps = {
  draft: JobDraft;
  set: <K extends keyof JobDraft>(key: K) => (value: JobDraft[K]) => void;
  errors: Record<string, string[] | undefined>;
};

/** The job's inputs, grouped as a person walks the house: the house, the roof, snow and standard, notes. */
export function JobFormFields({ draft, set, errors }: JobFormFieldsProps) {
  return (
    <>
      <Card title="The house">
        <TextField
          label="Job name"
          hint="What your crew calls it, e.g. “Alder Street hallway”."
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
          {...wholeNumberKeyboard}
        />
        <TextField
          label="Stories"
          testID="job-stories"
          value={draft.stories}
          onChangeText={set('stories')}
          errors={errors.stories}
          {...wholeNumberKeyboard}
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
          {...fractionKeyboard}
        />
        <TextField
          label="Building width"
          hint="Outside wall to outside wall, across the ridge. Blank if not measured yet."
          unit="ft"
          testID="job-building-width"
          value={draft.buildingWidthFt}
          onChangeText={set('buildingWidthFt')}
          errors={errors.buildingWidthFt}
          {...fractionKeyboard}
        />
      </Card>
      <Card title="Snow and load standard">
        <ChoiceGroup
          label="Code the town has adopted"
          testID="job-adopted-code"
          choices={codeChoices}
          value={draft.adoptedCode ?? 'unknown'}
          onChange={(code) => {
            set('adoptedCode')(code === 'unknown' ? null : code);
            if (code !== 'unknown') set('loadStandard')(asceEditionForCode(code));
          }}
        />
        <Text variant="caption" tone="muted">
          Choosing the code sets the load standard below: IRC 2024 uses ASCE 7-22; IRC 2021 uses ASCE 7-16;
          older editions use older ASCE 7 editions, and Tributary uses ASCE 7-16 for them (from memory;
          confirm with the building department). Change the standard if you know better.
        </Text>
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
          {...fractionKeyboard}
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
    </>
  );
}
