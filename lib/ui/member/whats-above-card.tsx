import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import {
  ageDefaults,
  ATTIC_EQUIPMENT,
  ROOF_COVERINGS,
  whatsAboveSources,
  type AtticEquipment,
  type RoofCovering,
  type WhatsAbove,
} from '@/lib/calc';
import { colors, radii, spacing } from '@/lib/theme';
import { Button } from '@/lib/ui/button';
import { CheckRow } from '@/lib/ui/check-row';
import { ChoiceGroup } from '@/lib/ui/choice-group';
import { FieldMessages } from '@/lib/ui/field-messages';
import { fieldProps, type TextKeys } from '@/lib/ui/field-props';
import { Text } from '@/lib/ui/text';
import { TextField } from '@/lib/ui/text-field';
import { loadSourceSchema } from '@/shared/schemas/calc/loads';
import type { Job } from '@/shared/schemas/jobs';
import { sourceDraft } from './draft-from-input';
import { DraftReader } from './member-input';
import type { SourceDraft } from './source-draft';

type Form = {
  roof: boolean;
  covering: RoofCovering;
  layers: string;
  solar: boolean;
  rafterLeft: string;
  rafterRight: string;
  overhang: string;
  ceiling: boolean;
  plaster: boolean;
  storage: boolean;
  ceilingLeft: string;
  ceilingRight: string;
  ceilingContinuous: boolean;
  floor: boolean;
  sleeping: boolean;
  tile: boolean;
  floorLeft: string;
  floorRight: string;
  floorContinuous: boolean;
  wall: boolean;
  wallHeight: string;
  wallPlaster: boolean;
  equipment: AtticEquipment | 'none';
  equipmentAt: string;
};

const coveringChoices = (Object.keys(ROOF_COVERINGS) as RoofCovering[]).map((value) => ({
  value,
  label: ROOF_COVERINGS[value].label,
}));
const equipmentChoices = [
  { value: 'none' as const, label: 'Nothing heavy' },
  ...(Object.keys(ATTIC_EQUIPMENT) as AtticEquipment[]).map((value) => ({
    value,
    label: ATTIC_EQUIPMENT[value].label,
  })),
];

function initialForm(job: Job): Form {
  const age = ageDefaults(job.yearBuilt);
  return {
    roof: true,
    covering: 'asphalt',
    layers: String(age.extraShingleLayers),
    solar: false,
    rafterLeft: '',
    rafterRight: '',
    overhang: '0',
    ceiling: true,
    plaster: age.plaster,
    storage: false,
    ceilingLeft: '',
    ceilingRight: '',
    ceilingContinuous: false,
    floor: job.stories > 1,
    sleeping: false,
    tile: false,
    floorLeft: '',
    floorRight: '',
    floorContinuous: false,
    wall: false,
    wallHeight: '8',
    wallPlaster: age.plaster,
    equipment: 'none',
    equipmentAt: '',
  };
}

/** "What's above": pick what sits over the wall and the spans each side; the load sources are built from it. */
export function WhatsAboveCard({
  job,
  onAdd,
  onClose,
}: {
  job: Job;
  onAdd: (sources: SourceDraft[]) => void;
  onClose: () => void;
}) {
  const [form, setForm] = useState<Form>(() => initialForm(job));
  const [errors, setErrors] = useState<Record<string, string[]>>({});
  const set =
    <K extends keyof Form>(key: K) =>
    (value: Form[K]) =>
      setForm((f) => ({ ...f, [key]: value }));
  const build = () => {
    const r = new DraftReader();
    const found = r.errors;
    const ft = (key: keyof Form, label: string, emptyIsZero = true) => {
      const text = String(form[key]).trim();
      if (text === '' && emptyIsZero) return 0;
      return r.parsedLength(key, text, label, 'ft') ?? 0;
    };
    const above: WhatsAbove = {};
    if (form.roof) {
      above.roof = {
        covering: form.covering,
        extraShingleLayers: Math.max(0, Math.min(3, Math.round(Number(form.layers) || 0))),
        solar: form.solar,
        spans: {
          leftFt: ft('rafterLeft', 'Rafter span, one side'),
          rightFt: ft('rafterRight', 'Rafter span, other side'),
        },
        overhangFt: ft('overhang', 'Overhang'),
      };
      if (above.roof.spans.leftFt + above.roof.spans.rightFt === 0)
        found.rafterLeft = ['Enter the rafter span on at least one side'];
    }
    if (form.ceiling) {
      above.ceiling = {
        finish: form.plaster ? 'plaster' : 'drywall',
        storage: form.storage,
        spans: {
          leftFt: ft('ceilingLeft', 'Ceiling joist span, one side'),
          rightFt: ft('ceilingRight', 'Ceiling joist span, other side'),
        },
        continuousOver: form.ceilingContinuous,
      };
      if (above.ceiling.spans.leftFt + above.ceiling.spans.rightFt === 0)
        found.ceilingLeft = ['Enter the joist span on at least one side'];
    }
    if (form.floor) {
      above.floor = {
        use: form.sleeping ? 'sleeping' : 'living',
        finish: form.tile ? 'tile' : 'wood',
        spans: {
          leftFt: ft('floorLeft', 'Floor joist span, one side'),
          rightFt: ft('floorRight', 'Floor joist span, other side'),
        },
        continuousOver: form.floorContinuous,
      };
      if (above.floor.spans.leftFt + above.floor.spans.rightFt === 0)
        found.floorLeft = ['Enter the joist span on at least one side'];
    }
    if (form.wall)
      above.wallAbove = { heightFt: ft('wallHeight', 'Wall height', false), plaster: form.wallPlaster };
    if (form.equipment !== 'none')
      above.equipment = [{ kind: form.equipment, atFt: ft('equipmentAt', 'Position', false) }];
    setErrors(found);
    if (Object.keys(found).length) return;
    const { sources, notes } = whatsAboveSources(above);
    onAdd(sources.map((s, i) => ({ ...sourceDraft(loadSourceSchema.parse(s)), note: notes[i] ?? '' })));
    onClose();
  };
  const span = (key: TextKeys<Form>, label: string) => (
    <View style={styles.cell}>
      <TextField
        label={label}
        unit="ft"
        {...fieldProps({ draft: form, set }, errors, key)}
        testID={`above-${key}`}
        keyboardType="numbers-and-punctuation"
      />
    </View>
  );
  return (
    <View style={styles.box} testID="whats-above">
      <Text variant="heading">What’s above this wall</Text>
      <Text variant="caption" tone="muted">
        Spans are measured level, from this wall to the next support on each side; half of each lands here.
        Defaults follow the house’s age where practice does (plaster before 1950, a second shingle layer
        before 1980).
      </Text>
      <CheckRow
        label="The roof bears on this line"
        value={form.roof}
        onChange={set('roof')}
        testID="above-roof"
      />
      {form.roof ? (
        <>
          <ChoiceGroup
            label="Roof covering"
            choices={coveringChoices}
            value={form.covering}
            onChange={set('covering')}
            testID="above-covering"
          />
          <View style={styles.grid}>
            {span('rafterLeft', 'Rafter span, one side')}
            {span('rafterRight', 'Rafter span, other side')}
            {span('overhang', 'Eave overhang')}
            <View style={styles.cell}>
              <TextField
                label="Extra shingle layers"
                value={form.layers}
                onChangeText={set('layers')}
                testID="above-layers"
                keyboardType="number-pad"
              />
            </View>
          </View>
          <CheckRow label="Solar panels on this roof" value={form.solar} onChange={set('solar')} />
        </>
      ) : null}
      <CheckRow
        label="Ceiling joists bear on this wall"
        value={form.ceiling}
        onChange={set('ceiling')}
        testID="above-ceiling"
      />
      {form.ceiling ? (
        <>
          <View style={styles.grid}>
            {span('ceilingLeft', 'Ceiling joist span, one side')}
            {span('ceilingRight', 'Ceiling joist span, other side')}
          </View>
          <CheckRow
            label="Plaster and lath ceiling"
            hint="About 8–10 psf more than drywall (common practice)."
            value={form.plaster}
            onChange={set('plaster')}
          />
          <CheckRow label="Attic used for storage" value={form.storage} onChange={set('storage')} />
          <CheckRow
            label="Joists run continuous over the wall"
            value={form.ceilingContinuous}
            onChange={set('ceilingContinuous')}
          />
        </>
      ) : null}
      <CheckRow
        label="A floor above bears on this wall"
        value={form.floor}
        onChange={set('floor')}
        testID="above-floor"
      />
      {form.floor ? (
        <>
          <View style={styles.grid}>
            {span('floorLeft', 'Floor joist span, one side')}
            {span('floorRight', 'Floor joist span, other side')}
          </View>
          <CheckRow
            label="Bedrooms above"
            hint="30 psf live instead of 40."
            value={form.sleeping}
            onChange={set('sleeping')}
          />
          <CheckRow label="Tile floor above" value={form.tile} onChange={set('tile')} />
          <CheckRow
            label="Joists run continuous over the wall"
            value={form.floorContinuous}
            onChange={set('floorContinuous')}
          />
        </>
      ) : null}
      <CheckRow
        label="A wall stands on this one above"
        value={form.wall}
        onChange={set('wall')}
        testID="above-wall"
      />
      {form.wall ? (
        <>
          <View style={styles.grid}>{span('wallHeight', 'Wall height')}</View>
          <CheckRow label="Plastered wall" value={form.wallPlaster} onChange={set('wallPlaster')} />
        </>
      ) : null}
      <ChoiceGroup
        label="Heavy equipment in the attic over it"
        choices={equipmentChoices}
        value={form.equipment}
        onChange={set('equipment')}
      />
      {form.equipment !== 'none' ? (
        <View style={styles.grid}>{span('equipmentAt', 'Position from the left support')}</View>
      ) : null}
      <FieldMessages messages={Object.keys(errors).length ? ['Fix the fields marked above.'] : undefined} />
      <View style={styles.actions}>
        <Button label="Add these loads" icon="plus" onPress={build} testID="above-add" />
        <Button label="Cancel" variant="secondary" onPress={onClose} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    gap: spacing.md,
    padding: spacing.md,
    borderRadius: radii.md,
    borderWidth: 2,
    borderColor: colors.accent,
    backgroundColor: colors.surface,
  },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  cell: { flexGrow: 1, flexBasis: 150 },
  actions: { flexDirection: 'row', gap: spacing.sm, flexWrap: 'wrap' },
});
