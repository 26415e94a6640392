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
  const { draft, set, setFlag } = form;
  const flagProps = (
    field:
      | 'unbracedLength'
      | 'deflectionCap'
      | 'joistDepth'
      | 'underJoistsHeight'
      | 'atticClearance'
      | 'supportWidth'
      | 'temperature',
  ) => ({
    flag: draft.flags[field] ?? 'default',
    onFlag: (f: 'measured' | 'assumed' | 'default') => setFlag(field, f),
  });
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
          value={draft.unbracedLength}
          onChangeText={set('unbracedLength')}
          errors={errors.unbracedLength}
          testID="unbraced-length"
          {...flagProps('unbracedLength')}
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
        value={draft.deflectionCap}
        onChangeText={set('deflectionCap')}
        errors={errors.deflectionCap}
        testID="deflection-cap"
        {...flagProps('deflectionCap')}
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
            value={draft.joistDepth}
            onChangeText={set('joistDepth')}
            errors={errors.joistDepth}
            testID="joist-depth"
            {...flagProps('joistDepth')}
          />
          <MeasureField
            label="Attic clearance (optional)"
            hint="From the ceiling line up to the underside of the roof framing where the member goes."
            unit="in"
            tape
            value={draft.atticClearance}
            onChangeText={set('atticClearance')}
            errors={errors.atticClearance}
            testID="attic-clearance"
            {...flagProps('atticClearance')}
          />
        </>
      ) : draft.mount === 'flush' ? (
        <MeasureField
          label="Joist depth"
          hint="The deepest a flush member may be."
          unit="in"
          value={draft.joistDepth}
          onChangeText={set('joistDepth')}
          errors={errors.joistDepth}
          testID="joist-depth"
          {...flagProps('joistDepth')}
        />
      ) : (
        <MeasureField
          label="Floor to the underside of the joists (optional)"
          hint="For the headroom under a dropped member."
          unit="in"
          tape
          value={draft.underJoistsHeight}
          onChangeText={set('underJoistsHeight')}
          errors={errors.underJoistsHeight}
          testID="under-joists"
          {...flagProps('underJoistsHeight')}
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
        value={draft.supportWidth}
        onChangeText={set('supportWidth')}
        errors={errors.supportWidth}
        testID="support-width"
        {...flagProps('supportWidth')}
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
        value={draft.temperature}
        onChangeText={set('temperature')}
        errors={errors.temperature}
        testID="temperature"
        {...flagProps('temperature')}
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
export const ConditionsCard = memo(
  ConditionsCardView,
  sameCardSlice(
    [
      'braced',
      'unbracedLength',
      'deflectionUse',
      'deflectionCap',
      'mount',
      'joistDepth',
      'underJoistsHeight',
      'atticClearance',
      'supportKind',
      'supportWidth',
      'plateMaterialId',
      'wetService',
      'temperature',
      'posts',
      'flags',
    ],
    [
      'unbracedLength',
      'deflectionCap',
      'joistDepth',
      'underJoistsHeight',
      'atticClearance',
      'supportWidth',
      'temperature',
      'posts',
    ],
  ),
);
