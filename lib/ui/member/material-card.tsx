import { memo } from 'react';
import { Card } from '@/lib/ui/card';
import { CheckRow } from '@/lib/ui/check-row';
import { ChoiceGroup } from '@/lib/ui/choice-group';
import { PickerField } from '@/lib/ui/picker-field';
import type { MemberDraftState } from '@/lib/hooks/use-member-draft';
import { familyChoices, familyOf, materialChoices, sizeChoices, type MaterialFamily } from './choices';
import { sameCardSlice } from './card-memo';
import type { FieldErrors } from './member-input';

/** Material family, material (species and grade, or class), size and plies. */
function MaterialCardView({ form, errors }: { form: MemberDraftState; errors: FieldErrors }) {
  const { draft, set } = form;
  const family = familyOf(draft.materialId);
  const sizes = sizeChoices(draft.materialId);
  const pickFamily = (next: MaterialFamily) => {
    const first = materialChoices(next)[0]?.value;
    if (first) pickMaterial(first);
  };
  const pickMaterial = (materialId: string) => {
    set('materialId')(materialId);
    const list = sizeChoices(materialId);
    if (!list.some((s) => s.value === draft.sizeId))
      set('sizeId')(list[Math.floor(list.length / 2)]?.value ?? '');
  };
  return (
    <Card title="Material and size">
      <ChoiceGroup
        label="Material"
        choices={familyChoices}
        value={family}
        onChange={pickFamily}
        testID="material-family"
      />
      <PickerField
        label={
          family === 'sawn' ? 'Species and grade' : family === 'lvl' ? 'LVL grade' : 'Glulam stress class'
        }
        hint={
          family === 'lvl' ? 'Generic values: confirm with the manufacturer’s published values.' : undefined
        }
        choices={materialChoices(family)}
        value={draft.materialId}
        onChange={pickMaterial}
        errors={errors.materialId}
        testID="material"
      />
      <PickerField
        label="Size"
        choices={sizes}
        value={draft.sizeId}
        onChange={set('sizeId')}
        errors={errors.sizeId}
        testID="size"
      />
      {family === 'sawn' ? (
        <CheckRow
          label="Grade stamp can't be read"
          hint="The weakest grade of the species is used."
          value={draft.gradeUnknown}
          onChange={set('gradeUnknown')}
          testID="grade-unknown"
        />
      ) : null}
      <CheckRow
        label="Include the member's own weight"
        value={draft.selfWeight}
        onChange={set('selfWeight')}
      />
    </Card>
  );
}

/** Material inputs of the member editor; renders again only when its own fields change. */
export const MaterialCard = memo(MaterialCardView, sameCardSlice('material'));
