import { DEFAULT_BEARING_IN } from '@/lib/calc';
import { formatFtIn, formatIn } from '@/lib/format';
import { Card } from '@/lib/ui/card';
import { CheckRow } from '@/lib/ui/check-row';
import { ChoiceGroup } from '@/lib/ui/choice-group';
import { FieldMessages } from '@/lib/ui/field-messages';
import { fieldProps } from '@/lib/ui/field-props';
import {
  deflectionChoices,
  familyChoices,
  materialChoices,
  type MaterialFamily,
} from '@/lib/ui/member/choices';
import { PickerField } from '@/lib/ui/picker-field';
import { Text } from '@/lib/ui/text';
import { TextField } from '@/lib/ui/text-field';
import { loadStandardEditions, type LoadStandard } from '@/shared/schemas/jobs';
import { firstMaterialOf, plyCounts, withMaterial, type SpanTableDraft } from './span-table-draft';
import type { FieldErrors } from './span-table-input';
import { parseWidthList } from './width-list';

const editionChoices = loadStandardEditions.map((e) => ({ value: e as LoadStandard, label: e }));

const materialLabel: Record<MaterialFamily, string> = {
  sawn: 'Species and grade',
  lvl: 'LVL grade',
  glulam: 'Glulam stress class',
};

type FormProps = {
  draft: SpanTableDraft;
  errors: FieldErrors;
  onChange: (draft: SpanTableDraft) => void;
};

/** The span table's inputs: material and plies, loads and edition, widths, bearing and deflection use. */
export function SpanTableForm({ draft, errors, onChange }: FormProps) {
  const set =
    <K extends keyof SpanTableDraft>(key: K) =>
    (value: SpanTableDraft[K]) =>
      onChange({ ...draft, [key]: value });
  const form = { draft, set };
  const plies = plyCounts(draft.materialId);
  const togglePly = (count: number) =>
    onChange({
      ...draft,
      plies: draft.plies.includes(count)
        ? draft.plies.filter((p) => p !== count)
        : [...draft.plies, count].sort((a, b) => a - b),
    });
  const widths = parseWidthList(draft.widths);
  return (
    <>
      <Card title="Material">
        <ChoiceGroup
          label="Material"
          choices={familyChoices}
          value={draft.family}
          onChange={(family) => onChange({ ...withMaterial(draft, firstMaterialOf(family)), family })}
          testID="span-family"
        />
        <PickerField
          label={materialLabel[draft.family]}
          hint={
            draft.family === 'lvl'
              ? 'Generic values: confirm with the manufacturer’s published values.'
              : undefined
          }
          choices={materialChoices(draft.family)}
          value={draft.materialId}
          onChange={(materialId) => onChange(withMaterial(draft, materialId))}
          errors={errors.materialId}
          testID="span-material"
        />
        {plies.length > 1 ? (
          <>
            <Text variant="label">Plies</Text>
            {plies.map((count) => (
              <CheckRow
                key={count}
                label={count === 1 ? 'One piece' : `${count} plies`}
                value={draft.plies.includes(count)}
                onChange={() => togglePly(count)}
                testID={`span-plies-${count}`}
              />
            ))}
            <FieldMessages messages={errors.plies} />
          </>
        ) : null}
        <CheckRow
          label="Include the member's own weight"
          value={draft.selfWeight}
          onChange={set('selfWeight')}
          testID="span-self-weight"
        />
        <CheckRow
          label="Print design spans instead"
          hint="Support centre to support centre. Off: clear spans between the supports, as measured on site."
          value={draft.designSpans}
          onChange={set('designSpans')}
          testID="span-design-spans"
        />
      </Card>
      <Card title="Loads per square foot">
        <Text variant="caption" tone="muted">
          On the area the member carries. Empty means no such load.
        </Text>
        <TextField
          label="Dead load"
          hint="Light-frame floor: 12 psf (HUD RSDG Table 3.2)."
          unit="psf"
          inputMode="decimal"
          {...fieldProps(form, errors, 'deadPsf')}
          testID="span-dead"
        />
        <TextField
          label="Live load"
          hint="Floor or attic. Dwelling rooms: 40 psf (ASCE 7-16 Table 4.3-1)."
          unit="psf"
          inputMode="decimal"
          {...fieldProps(form, errors, 'livePsf')}
          testID="span-live"
        />
        <TextField
          label="Roof live load"
          unit="psf"
          inputMode="decimal"
          {...fieldProps(form, errors, 'roofLivePsf')}
          testID="span-roof-live"
        />
        <TextField
          label="Roof snow load"
          hint="The design roof snow, not the ground snow."
          unit="psf"
          inputMode="decimal"
          {...fieldProps(form, errors, 'roofSnowPsf')}
          testID="span-snow"
        />
        <ChoiceGroup
          label="Load standard"
          choices={editionChoices}
          value={draft.edition}
          onChange={set('edition')}
          errors={errors.edition}
          testID="span-edition"
        />
      </Card>
      <Card title="Widths and limits">
        <TextField
          label="Tributary widths"
          hint={`In feet, with commas between: 4, 8, 12, 16 or 6' 6", 13' 4"`}
          unit="ft"
          {...fieldProps(form, errors, 'widths')}
          testID="span-widths"
        />
        {widths.widthsFt.length && !errors.widths ? (
          <Text variant="caption" tone="muted" testID="span-widths-read">
            Reads as {widths.widthsFt.map((ft) => formatFtIn(ft * 12)).join(', ')}
          </Text>
        ) : null}
        <TextField
          label="Bearing length at each end"
          hint={`Two jack studs: 3 in. Empty: ${formatIn(DEFAULT_BEARING_IN)}.`}
          unit="in"
          {...fieldProps(form, errors, 'bearing')}
          testID="span-bearing"
        />
        <PickerField
          label="What it holds up (deflection limits)"
          choices={deflectionChoices}
          value={draft.deflectionUse}
          onChange={set('deflectionUse')}
          errors={errors.deflectionUse}
          testID="span-deflection-use"
        />
      </Card>
    </>
  );
}
