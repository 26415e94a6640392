import { memo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { spacing } from '@/lib/theme';
import { Button } from '@/lib/ui/button';
import { Card } from '@/lib/ui/card';
import { ChoiceGroup } from '@/lib/ui/choice-group';
import { FieldMessages } from '@/lib/ui/field-messages';
import { Text } from '@/lib/ui/text';
import type { MemberDraftState } from '@/lib/hooks/use-member-draft';
import { roofThermalConditions, type RoofThermalCondition } from '@/shared/schemas/calc/loads';
import { loadStandardEditions, type Job, type LoadStandard } from '@/shared/schemas/jobs';
import { PickerField } from '@/lib/ui/picker-field';
import { sameCardSlice } from './card-memo';
import type { FieldErrors } from './member-input';
import { MeasureField } from './measure-field';
import { fieldProps } from '@/lib/ui/field-props';
import { SourceCard } from './source-card';
import { sourceKindLabels, type SourceKind } from './source-draft';
import { WhatsAboveCard } from './whats-above-card';

const addable: SourceKind[] = ['roof', 'ceiling', 'floor', 'wall-above', 'point'];

type EditionChoice = 'job' | LoadStandard;

const thermalLabels: Record<RoofThermalCondition, { label: string; description: string }> = {
  'vented-attic-insulated-ceiling': {
    label: 'Vented attic over an insulated ceiling',
    description: 'The usual house: more than R-25 in the ceiling',
  },
  'vented-attic-little-insulation': {
    label: 'Vented attic, little ceiling insulation',
    description: 'R-25 or less between the attic and the rooms',
  },
  'heated-unvented': {
    label: 'Heated, roof not vented',
    description: 'Cathedral ceiling or insulation at the roof deck',
  },
  unheated: { label: 'Unheated building', description: 'Detached garage, shed, open porch roof' },
};
const thermalChoices = roofThermalConditions.map((value) => ({ value, ...thermalLabels[value] }));

/** The job's load context (shown, overridable here) and the member's load sources. */
function LoadsCardView({ form, errors, job }: { form: MemberDraftState; errors: FieldErrors; job: Job }) {
  const { draft, set } = form;
  const [above, setAbove] = useState(false);
  const editionChoices = [
    { value: 'job' as EditionChoice, label: `From the job (${job.loadStandard})` },
    ...loadStandardEditions.map((e) => ({ value: e as EditionChoice, label: e })),
  ];
  return (
    <Card title="Loads">
      <Text variant="caption" tone="muted">
        From the job: {job.loadStandard}, ground snow {job.groundSnowPsf} psf
        {job.groundSnowSource ? ` (${job.groundSnowSource})` : ''}, roof {job.roofType} at {job.roofPitchIn12}{' '}
        in 12.
      </Text>
      <ChoiceGroup
        label="Load standard for this member"
        choices={editionChoices}
        value={draft.edition ?? 'job'}
        onChange={(v) => set('edition')(v === 'job' ? null : v)}
        testID="member-edition"
      />
      <View style={styles.grid}>
        <View style={styles.cell}>
          <MeasureField
            label="Ground snow"
            unit="psf"
            {...fieldProps(form, errors, 'groundSnow')}
            testID="ground-snow"
          />
        </View>
        <View style={styles.cell}>
          <MeasureField
            label="Roof slope"
            unit="in 12"
            {...fieldProps(form, errors, 'roofPitch')}
            testID="roof-pitch"
          />
        </View>
      </View>
      <PickerField
        label="Roof's thermal condition (for the snow load)"
        hint="Sets the thermal factor C_t (ASCE 7 Table 7.3-2); the result shows the value used."
        choices={thermalChoices}
        value={draft.thermal}
        onChange={set('thermal')}
        testID="roof-thermal"
      />
      <Text variant="label">Load sources</Text>
      {above ? (
        <WhatsAboveCard job={job} onAdd={form.addSources} onClose={() => setAbove(false)} />
      ) : (
        <Button
          label="Build loads from what's above"
          variant="secondary"
          onPress={() => setAbove(true)}
          testID="open-whats-above"
        />
      )}
      {draft.sources.length === 0 ? (
        <Text tone="muted">No loads yet. Add what lands on this member.</Text>
      ) : null}
      {draft.sources.map((source, index) => (
        <SourceCard
          key={source.key}
          source={source}
          index={index}
          count={draft.sources.length}
          errors={errors}
          setSource={form.setSource}
          moveSource={form.moveSource}
          removeSource={form.removeSource}
        />
      ))}
      <FieldMessages messages={errors.sources} />
      <View style={styles.add}>
        {addable.map((kind) => (
          <Button
            key={kind}
            label={`Add ${sourceKindLabels[kind].toLowerCase()}`}
            icon="plus"
            variant="secondary"
            onPress={() => form.addSource(kind)}
            testID={`add-${kind}`}
          />
        ))}
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  cell: { flexGrow: 1, flexBasis: 200 },
  add: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});

/** Loads inputs of the member editor; renders again only when its own fields change. */
export const LoadsCard = memo(LoadsCardView, sameCardSlice('loads'));
