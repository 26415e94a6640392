import { memo } from 'react';
import { Card } from '@/lib/ui/card';
import { CheckRow } from '@/lib/ui/check-row';
import { ChoiceGroup } from '@/lib/ui/choice-group';
import { PickerField } from '@/lib/ui/picker-field';
import type { MemberDraftState } from '@/lib/hooks/use-member-draft';
import { deflectionChoices, materialChoices, sizeChoices } from './choices';
import type { MountKind, SupportKind } from './member-draft';
import { sameCardSlice } from './card-memo';
import type { FieldErrors } from './member-input';
import { MeasureField } from './measure-field';
import { fieldProps } from '@/lib/ui/field-props';

const mountChoices = [
  { value: 'dropped' as MountKind, label: 'Dropped', description: 'Below the joists: check the headroom' },
  { value: 'flush' as MountKind, label: 'Flush', description: 'In the joist depth: a hanger on every joist' },
  {
    value: 'raised' as MountKind,
    label: 'Raised into the attic',
    description: 'Above the ceiling: each ceiling joist hung from it by a hanger or strap',
  },
];
const supportChoices = [
  { value: 'jacks' as SupportKind, label: 'Jack studs on a plate' },
  { value: 'post' as SupportKind, label: 'A post' },
];

/** Bracing, deflection use, mount, what the ends bear on, service conditions and posts under the ends. */
function ConditionsCardView({ form, errors }: { form: MemberDraftState; errors: FieldErrors }) {
  const { draft, set } = form;
  return (
    <Card title="Conditions">
      <CheckRow
        label="Top edge braced along its length"
        hint="Joists or sheathing fastened to it. Off: give the unbraced length."
        value={draft.braced}
        onChange={set('braced')}
        testID="braced"
      />
      {draft.braced ? null : (
        <MeasureField
          label="Unbraced length"
          unit="ft"
          tape
          {...fieldProps(form, errors, 'unbracedLength')}
          testID="unbraced-length"
        />
      )}
      <PickerField
        label="What it holds up (deflection limits)"
        choices={deflectionChoices}
        value={draft.deflectionUse}
        onChange={set('deflectionUse')}
        testID="deflection-use"
      />
      <MeasureField
        label="Deflection cap (optional)"
        hint="E.g. 3/8 in for a flush beam under a finished floor."
        unit="in"
        {...fieldProps(form, errors, 'deflectionCap')}
        testID="deflection-cap"
      />
      <ChoiceGroup
        label="Mount"
        choices={mountChoices}
        value={draft.mount}
        onChange={set('mount')}
        testID="mount"
      />
      {draft.mount === 'raised' ? (
        <>
          <MeasureField
            label="Ceiling joist depth"
            unit="in"
            {...fieldProps(form, errors, 'joistDepth')}
            testID="joist-depth"
          />
          <MeasureField
            label="Attic clearance (optional)"
            hint="From the ceiling line up to the underside of the roof framing where the member goes."
            unit="in"
            tape
            {...fieldProps(form, errors, 'atticClearance')}
            testID="attic-clearance"
          />
        </>
      ) : draft.mount === 'flush' ? (
        <MeasureField
          label="Joist depth"
          hint="The deepest a flush member may be."
          unit="in"
          {...fieldProps(form, errors, 'joistDepth')}
          testID="joist-depth"
        />
      ) : (
        <MeasureField
          label="Floor to the underside of the joists (optional)"
          hint="For the headroom under a dropped member."
          unit="in"
          tape
          {...fieldProps(form, errors, 'underJoistsHeight')}
          testID="under-joists"
        />
      )}
      <ChoiceGroup
        label="The ends bear on"
        choices={supportChoices}
        value={draft.supportKind}
        onChange={set('supportKind')}
        testID="support-kind"
      />
      <MeasureField
        label="Support width"
        hint="Wall depth (3-1/2 in for 2x4, 5-1/2 in for 2x6) or post face."
        unit="in"
        {...fieldProps(form, errors, 'supportWidth')}
        testID="support-width"
      />
      {draft.supportKind === 'jacks' ? (
        <PickerField
          label="Plate under the jack studs"
          choices={materialChoices('sawn')}
          value={draft.plateMaterialId}
          onChange={set('plateMaterialId')}
          testID="plate-material"
        />
      ) : null}
      <CheckRow
        label="Wet service"
        hint="Moisture above 19 % in service."
        value={draft.wetService}
        onChange={set('wetService')}
      />
      <MeasureField
        label="Sustained temperature (optional)"
        unit="°F"
        {...fieldProps(form, errors, 'temperature')}
        testID="temperature"
      />
      <CheckRow
        label="Posts under the ends"
        hint="Checks each post and sizes a footing pad at the presumptive soil bearing."
        value={draft.posts.on}
        onChange={(on) => set('posts')({ ...draft.posts, on })}
        testID="posts-on"
      />
      {draft.posts.on ? (
        <>
          <PickerField
            label="Post material"
            choices={materialChoices('sawn')}
            value={draft.posts.materialId}
            onChange={(materialId) => set('posts')({ ...draft.posts, materialId })}
            testID="post-material"
          />
          <PickerField
            label="Post size"
            choices={sizeChoices(draft.posts.materialId)}
            value={draft.posts.sizeId}
            onChange={(sizeId) => set('posts')({ ...draft.posts, sizeId })}
            testID="post-size"
          />
          <MeasureField
            label="Post height"
            unit="ft"
            tape
            value={draft.posts.height}
            onChangeText={(height) => set('posts')({ ...draft.posts, height })}
            errors={errors['posts.height']}
            testID="post-height"
          />
        </>
      ) : null}
    </Card>
  );
}

/** Conditions inputs of the member editor; renders again only when its own fields change. */
export const ConditionsCard = memo(ConditionsCardView, sameCardSlice('conditions'));
