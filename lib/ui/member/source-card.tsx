import { memo } from 'react';
import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '@/lib/theme';
import { Button } from '@/lib/ui/button';
import { CheckRow } from '@/lib/ui/check-row';
import type { Choice } from '@/lib/ui/choice-group';
import { PickerField } from '@/lib/ui/picker-field';
import { Text } from '@/lib/ui/text';
import { TextField } from '@/lib/ui/text-field';
import type { FieldErrors } from './member-input';
import { MeasureField } from './measure-field';
import { pointKindLabels, sourceKindLabels, type PointKind, type SourceDraft } from './source-draft';

const pointChoices: Choice<PointKind>[] = (Object.keys(pointKindLabels) as PointKind[]).map((value) => ({
  value,
  label: pointKindLabels[value],
}));

type SourceCardProps = {
  source: SourceDraft;
  index: number;
  count: number;
  errors: FieldErrors;
  setSource: (index: number, patch: Partial<SourceDraft>) => void;
  moveSource: (index: number, step: -1 | 1) => void;
  removeSource: (index: number) => void;
};

/** One load source: its numbers by kind, where they came from, its flag, and move / remove. */
function SourceCardView({
  source,
  index,
  count,
  errors,
  setSource,
  moveSource,
  removeSource,
}: SourceCardProps) {
  const onChange = (patch: Partial<SourceDraft>) => setSource(index, patch);
  const onMove = (step: -1 | 1) => moveSource(index, step);
  const onRemove = () => removeSource(index);
  const e = (field: string) => errors[`sources.${index}.${field}`];
  const id = `source-${index}`;
  const area = source.kind === 'roof' || source.kind === 'ceiling' || source.kind === 'floor';
  return (
    <View
      style={styles.card}
      testID={id}
      aria-label={`Load source ${index + 1}: ${sourceKindLabels[source.kind]}`}
    >
      <View style={styles.head}>
        <Text variant="heading" style={styles.title}>
          {index + 1}. {sourceKindLabels[source.kind]}
        </Text>
        <Button
          label="Up"
          variant="quiet"
          disabled={index === 0}
          onPress={() => onMove(-1)}
          testID={`${id}-up`}
        />
        <Button
          label="Down"
          variant="quiet"
          disabled={index === count - 1}
          onPress={() => onMove(1)}
          testID={`${id}-down`}
        />
        <Button label="Remove" variant="quiet" onPress={onRemove} testID={`${id}-remove`} />
      </View>
      <TextField
        label="Label"
        value={source.label}
        onChangeText={(label) => onChange({ label })}
        testID={`${id}-label`}
      />
      {source.kind === 'point' ? (
        <>
          <PickerField
            label="What it comes from"
            choices={pointChoices}
            value={source.pointKind}
            onChange={(pointKind) => onChange({ pointKind, label: pointKindLabels[pointKind] })}
            testID={`${id}-point-kind`}
          />
          <MeasureField
            label="Position from the left support"
            hint="Measured from the face of the left support (from the tip of a left overhang)."
            unit="ft"
            tape
            value={source.at}
            onChangeText={(at) => onChange({ at })}
            errors={e('at')}
            testID={`${id}-at`}
          />
          <View style={styles.grid}>
            <LoadField
              label="Dead"
              value={source.deadLb}
              unit="lb"
              errors={e('deadLb')}
              onChangeText={(deadLb) => onChange({ deadLb })}
              testID={`${id}-dead-lb`}
            />
            <LoadField
              label="Live"
              value={source.liveLb}
              unit="lb"
              errors={e('liveLb')}
              onChangeText={(liveLb) => onChange({ liveLb })}
              testID={`${id}-live-lb`}
            />
            <LoadField
              label="Roof live"
              value={source.roofLiveLb}
              unit="lb"
              errors={e('roofLiveLb')}
              onChangeText={(roofLiveLb) => onChange({ roofLiveLb })}
              testID={`${id}-roof-live-lb`}
            />
            <LoadField
              label="Snow"
              value={source.snowLb}
              unit="lb"
              errors={e('snowLb')}
              onChangeText={(snowLb) => onChange({ snowLb })}
              testID={`${id}-snow-lb`}
            />
          </View>
        </>
      ) : null}
      {area ? (
        <MeasureField
          label="Tributary width"
          hint={
            source.kind === 'roof'
              ? 'Roof carried per foot of member, on plan.'
              : 'Half the joist span each side that lands here.'
          }
          unit="ft"
          tape
          value={source.tributary}
          onChangeText={(tributary) => onChange({ tributary })}
          errors={e('tributary')}
          testID={`${id}-tributary`}
        />
      ) : null}
      {source.kind === 'wall-above' ? (
        <>
          <CheckRow
            label="Give the wall's height and weight"
            hint="Off: give its load per foot instead."
            value={source.wallByHeight}
            onChange={(wallByHeight) => onChange({ wallByHeight })}
          />
          {source.wallByHeight ? (
            <View style={styles.grid}>
              <LoadField
                label="Wall height"
                value={source.wallHeight}
                unit="ft"
                errors={e('wallHeight')}
                onChangeText={(wallHeight) => onChange({ wallHeight })}
                testID={`${id}-wall-height`}
              />
              <LoadField
                label="Wall dead load"
                value={source.deadPsf}
                unit="psf"
                errors={e('deadPsf')}
                onChangeText={(deadPsf) => onChange({ deadPsf })}
                testID={`${id}-dead`}
              />
            </View>
          ) : (
            <LoadField
              label="Wall load"
              value={source.wallPlf}
              unit="plf"
              errors={e('wallPlf')}
              onChangeText={(wallPlf) => onChange({ wallPlf })}
              testID={`${id}-wall-plf`}
            />
          )}
        </>
      ) : null}
      {area ? (
        <View style={styles.grid}>
          <LoadField
            label="Dead load"
            value={source.deadPsf}
            unit="psf"
            errors={e('deadPsf')}
            onChangeText={(deadPsf) => onChange({ deadPsf })}
            testID={`${id}-dead`}
          />
          <LoadField
            label={
              source.kind === 'roof'
                ? 'Roof live load'
                : source.kind === 'ceiling'
                  ? 'Attic live load'
                  : 'Floor live load'
            }
            value={source.livePsf}
            unit="psf"
            errors={e('livePsf')}
            onChangeText={(livePsf) => onChange({ livePsf })}
            testID={`${id}-live`}
          />
        </View>
      ) : null}
      {source.kind === 'roof' ? (
        <CheckRow
          label="Dead load is along the slope"
          hint="Tributary converts it to plan by dividing by cos θ."
          value={source.deadAlongSlope}
          onChange={(deadAlongSlope) => onChange({ deadAlongSlope })}
        />
      ) : null}
      {source.kind === 'ceiling' || source.kind === 'floor' ? (
        <CheckRow
          label="Joists run continuous over this member"
          hint="Not lapped or spliced over it: it takes 1.25× the half-span load (AWC Design Aid No. 6)."
          value={source.continuousOver}
          onChange={(continuousOver) => onChange({ continuousOver })}
          testID={`${id}-continuous`}
        />
      ) : null}
      {source.kind !== 'point' ? (
        <>
          <CheckRow
            label="Covers only part of the span"
            value={source.partial}
            onChange={(partial) => onChange({ partial })}
            testID={`${id}-partial`}
          />
          {source.partial ? (
            <View style={styles.grid}>
              <LoadField
                label="From"
                value={source.start}
                unit="ft"
                errors={e('start')}
                onChangeText={(start) => onChange({ start })}
                testID={`${id}-start`}
              />
              <LoadField
                label="To"
                value={source.end}
                unit="ft"
                errors={e('end')}
                onChangeText={(end) => onChange({ end })}
                testID={`${id}-end`}
              />
            </View>
          ) : null}
        </>
      ) : null}
      <View style={styles.foot}>
        <Text variant="caption" tone="muted" style={styles.note}>
          {source.note || 'Values entered by you.'}
        </Text>
        <Button
          label={`Values: ${source.flag}`}
          variant="secondary"
          accessibilityHint="Tap to change how these values were obtained"
          onPress={() =>
            onChange({
              flag:
                source.flag === 'measured' ? 'assumed' : source.flag === 'assumed' ? 'default' : 'measured',
            })
          }
          testID={`${id}-flag`}
        />
      </View>
    </View>
  );
}

function LoadField(props: {
  label: string;
  value: string;
  unit: string;
  errors?: string[];
  onChangeText: (text: string) => void;
  testID: string;
}) {
  return (
    <View style={styles.cell}>
      <TextField {...props} keyboardType="numbers-and-punctuation" autoCorrect={false} />
    </View>
  );
}

const styles = StyleSheet.create({
  card: {
    gap: spacing.md,
    padding: spacing.md,
    borderRadius: radii.md,
    borderWidth: 1,
    borderColor: colors.lineStrong,
    backgroundColor: colors.paper,
  },
  head: { flexDirection: 'row', alignItems: 'center', flexWrap: 'wrap', gap: spacing.xs },
  title: { flex: 1, minWidth: 120 },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  cell: { flexGrow: 1, flexBasis: 130 },
  foot: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm, flexWrap: 'wrap' },
  note: { flex: 1, minWidth: 160 },
});

const messagesOf = (props: SourceCardProps) =>
  JSON.stringify(Object.entries(props.errors).filter(([path]) => path.startsWith(`sources.${props.index}.`)));

/** One load source of the member editor; renders again only when this source or its messages change. */
export const SourceCard = memo(
  SourceCardView,
  (a, b) =>
    a.source === b.source &&
    a.index === b.index &&
    a.count === b.count &&
    a.setSource === b.setSource &&
    messagesOf(a) === messagesOf(b),
);
