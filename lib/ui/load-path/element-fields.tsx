import { View, StyleSheet } from 'react-native';
import { spacing } from '@/lib/theme';
import type { ApiError } from '@/lib/api/client';
import { ChoiceGroup, type Choice } from '@/lib/ui/choice-group';
import { PickerField } from '@/lib/ui/picker-field';
import { Text } from '@/lib/ui/text';
import { TextField } from '@/lib/ui/text-field';
import type { ElementDraft } from './element-draft';

const woodChoices: Choice<string>[] = [
  { value: 'sawn-douglas-fir-larch-no2', label: 'Douglas Fir-Larch No.2' },
  { value: 'sawn-spruce-pine-fir-no1-no2', label: 'Spruce-Pine-Fir No.1/No.2' },
  { value: 'sawn-southern-pine-no2', label: 'Southern Pine No.2' },
  { value: 'sawn-hem-fir-no2', label: 'Hem-Fir No.2' },
];
const postSizes = ['4x4', '4x6', '6x6', '6x8', '8x8'].map((s) => ({ value: s, label: s }));
const studSizes = ['2x4', '2x6'].map((s) => ({ value: s, label: s }));
const beamSizes = ['2x8', '2x10', '2x12'].flatMap((s) =>
  [1, 2, 3].map((p) => ({ value: p === 1 ? s : `${p}-ply-${s}`, label: p === 1 ? s : `${p} × ${s}` })),
);
const yesNo: Choice<'yes' | 'no'>[] = [
  { value: 'yes', label: 'Yes' },
  { value: 'no', label: 'No' },
];

/** Field messages of one draft field, from a 400 whose fields end with `path` ("heightFt", "input.clearSpanFt"). */
export function errorsAt(error: ApiError | null, path: string): string[] | undefined {
  if (!error) return undefined;
  const found = Object.entries(error.fields)
    .filter(([key]) => key === path || key.endsWith(`.${path}`))
    .flatMap(([, messages]) => messages);
  return found.length > 0 ? found : undefined;
}

type Props = {
  draft: ElementDraft;
  onChange: (next: ElementDraft) => void;
  error: ApiError | null;
  testID: string;
};

/** The fields of one piece of existing framing, by kind: measured sizes, unknown grade, confirmation. */
export function ElementFields({ draft: d, onChange, error, testID }: Props) {
  const set = (patch: Partial<ElementDraft>) => onChange({ ...d, ...patch });
  const numberField = (key: keyof ElementDraft, label: string, unit: string, path: string, hint?: string) => (
    <TextField
      label={label}
      hint={hint}
      unit={unit}
      value={String(d[key])}
      onChangeText={(text) => set({ [key]: text } as Partial<ElementDraft>)}
      keyboardType="decimal-pad"
      inputMode="decimal"
      errors={errorsAt(error, path)}
      testID={`${testID}-${key}`}
    />
  );
  const grade = (
    <ChoiceGroup
      label="Grade stamp unreadable or missing?"
      choices={yesNo}
      value={d.gradeUnknown ? 'yes' : 'no'}
      onChange={(v) => set({ gradeUnknown: v === 'yes' })}
      testID={`${testID}-grade-unknown`}
    />
  );
  const confirm = (what: string) => (
    <ChoiceGroup
      label={what}
      choices={yesNo}
      value={d.confirmed ? 'yes' : 'no'}
      onChange={(v) => set({ confirmed: v === 'yes' })}
      testID={`${testID}-confirmed`}
    />
  );
  const wood = (
    <PickerField
      label="Species and grade"
      choices={woodChoices}
      value={d.materialId}
      onChange={(materialId) => set({ materialId })}
      errors={errorsAt(error, 'materialId')}
      testID={`${testID}-material`}
    />
  );
  return (
    <View style={styles.fields}>
      {d.kind === 'girder' || d.kind === 'joist' ? (
        <>
          {numberField('spanFt', 'Clear span (between supports)', 'ft', 'input.clearSpanFt')}
          <PickerField
            label="Size (pieces × nominal)"
            choices={beamSizes}
            value={d.sizeId}
            onChange={(sizeId) => set({ sizeId })}
            testID={`${testID}-size`}
          />
          {wood}
          {grade}
          {numberField(
            'measuredWidthIn',
            'Measured width of one piece',
            'in',
            'input.measuredPly.bIn',
            'Old lumber: measure it. Leave blank for today’s sizes.',
          )}
          {numberField('measuredDepthIn', 'Measured depth', 'in', 'input.measuredPly.dIn')}
          {numberField(
            'floorTributaryFt',
            'Width of floor it carries',
            'ft',
            'input.sources',
            'Half the joist span on each side (10 psf dead, 40 psf live).',
          )}
          {numberField('bearingIn', 'Bearing length at each end', 'in', 'input.bearingLeftIn')}
          {numberField(
            'secondSpanFt',
            'Runs on over a post: second clear span',
            'ft',
            'input.secondClearSpanFt',
            'Only for a girder continuous over a post in the middle. Leave blank for one span.',
          )}
          {d.secondSpanFt.trim()
            ? numberField('centreBearingIn', 'Bearing on the middle post', 'in', 'input.centreBearingIn')
            : null}
        </>
      ) : null}
      {d.kind === 'wall' ? (
        <>
          {numberField('jackStuds', 'Jack studs under the end', 'studs', 'jackStuds')}
          <ChoiceGroup
            label="Stud size"
            choices={studSizes}
            value={d.sizeId}
            onChange={(sizeId) => set({ sizeId })}
            testID={`${testID}-size`}
          />
          {wood}
          {grade}
          {numberField('heightFt', 'Wall height', 'ft', 'heightFt')}
        </>
      ) : null}
      {d.kind === 'post' ? (
        <>
          <PickerField
            label="Post size"
            choices={postSizes}
            value={d.sizeId}
            onChange={(sizeId) => set({ sizeId })}
            testID={`${testID}-size`}
          />
          {wood}
          {grade}
          {numberField('heightFt', 'Post height', 'ft', 'heightFt')}
        </>
      ) : null}
      {d.kind === 'steel-column' ? (
        <>
          {numberField('heightFt', 'Column height', 'ft', 'heightFt')}
          {numberField(
            'ratedCapacityLb',
            'Capacity stamped on the column',
            'lb',
            'ratedCapacityLb',
            'Leave blank if it is not marked: an engineer checks it.',
          )}
        </>
      ) : null}
      {d.kind === 'pier' ? (
        <ChoiceGroup
          label="What is the pier made of?"
          choices={[
            { value: 'concrete', label: 'Poured concrete' },
            { value: 'concrete-block', label: 'Concrete block' },
            { value: 'brick', label: 'Brick', description: 'An engineer is required' },
            { value: 'rubble', label: 'Stone or rubble', description: 'An engineer is required' },
          ]}
          value={d.pierMaterial}
          onChange={(pierMaterial) => set({ pierMaterial })}
          testID={`${testID}-pier`}
        />
      ) : null}
      {d.kind === 'footing' ? (
        <>
          <ChoiceGroup
            label="Which footing?"
            choices={[
              { value: 'new-pad', label: 'A new pad', description: 'Sized here at the soil bearing' },
              { value: 'existing', label: 'An existing footing' },
            ]}
            value={d.footing}
            onChange={(footing) => set({ footing })}
            testID={`${testID}-footing`}
          />
          {d.footing === 'existing' ? (
            <>
              {numberField(
                'footingWidthIn',
                'Measured width',
                'in',
                'widthIn',
                'Leave blank if not known: an engineer decides what it carries.',
              )}
              {numberField('footingLengthIn', 'Measured length', 'in', 'lengthIn')}
            </>
          ) : null}
          {confirm(
            d.footing === 'new-pad'
              ? 'Will you pour this pad as sized (and have it inspected)?'
              : 'Have you seen this footing (dug to it, or on the plans)?',
          )}
        </>
      ) : null}
      {d.kind === 'foundation-wall'
        ? confirm('Have you seen the foundation wall under it, sound and continuous?')
        : null}
      {d.kind === 'slab' ? (
        <Text tone="muted">
          A slab is not a footing: a load on it needs an engineer (a pad cut in, or a thickened slab).
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({ fields: { gap: spacing.md } });
