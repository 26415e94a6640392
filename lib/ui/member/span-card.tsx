import { memo } from 'react';
import { Card } from '@/lib/ui/card';
import { CheckRow } from '@/lib/ui/check-row';
import { ChoiceGroup } from '@/lib/ui/choice-group';
import type { MemberDraftState } from '@/lib/hooks/use-member-draft';
import type { MeasuredTo } from './member-draft';
import { sameCardSlice } from './card-memo';
import type { FieldErrors } from './member-input';
import { MeasureField } from './measure-field';
import { fieldProps } from '@/lib/ui/field-props';

const measuredToChoices = [
  { value: 'framing' as MeasuredTo, label: 'Framing to framing' },
  { value: 'drywall' as MeasuredTo, label: 'Finished faces, drywall', description: 'Adds 1/2 in a side' },
  {
    value: 'plaster' as MeasuredTo,
    label: 'Finished faces, plaster',
    description: 'Plaster and lath: adds about 7/8 in a side (common practice)',
  },
];

/** The clear span off the tape, what it was measured between, and the bearing at each end. */
function SpanCardView({ form, errors }: { form: MemberDraftState; errors: FieldErrors }) {
  const { draft, set } = form;
  return (
    <Card title="Span and bearing">
      <MeasureField
        label="Clear span"
        hint={`Between the faces of the supports: 13' 6-3/8", 13-6-3/8, 13 6 3/8, 162 in or 4.1 m.`}
        unit="ft"
        tape
        {...fieldProps(form, errors, 'clearSpan')}
        testID="clear-span"
      />
      <ChoiceGroup
        label="Measured between"
        choices={measuredToChoices}
        value={draft.measuredTo}
        onChange={set('measuredTo')}
        testID="measured-to"
      />
      <MeasureField
        label="Bearing length, left end"
        hint="3 in is two jack studs."
        unit="in"
        {...fieldProps(form, errors, 'bearingLeft')}
        testID="bearing-left"
      />
      <MeasureField
        label="Bearing length, right end"
        unit="in"
        {...fieldProps(form, errors, 'bearingRight')}
        testID="bearing-right"
      />
      <CheckRow
        label="Continuous over a centre post (two spans)"
        hint="The clear span above is then the left span; the right bearing is at the far end."
        value={draft.continuous}
        onChange={set('continuous')}
        testID="continuous"
      />
      {draft.continuous ? (
        <>
          <MeasureField
            label="Second clear span"
            unit="ft"
            tape
            {...fieldProps(form, errors, 'secondSpan')}
            testID="second-span"
          />
          <MeasureField
            label="Bearing on the centre post"
            hint="3-1/2 in is a 4x4 post's face."
            unit="in"
            {...fieldProps(form, errors, 'centreBearing')}
            testID="centre-bearing"
          />
        </>
      ) : null}
      <MeasureField
        label="Overhang past the left support (optional)"
        hint="From the support's face to the tip. Load positions are then measured from the tip."
        unit="ft"
        {...fieldProps(form, errors, 'overhangLeft')}
        testID="overhang-left"
      />
      <MeasureField
        label="Overhang past the right support (optional)"
        unit="ft"
        {...fieldProps(form, errors, 'overhangRight')}
        testID="overhang-right"
      />
    </Card>
  );
}

/** Span inputs of the member editor; renders again only when its own fields change. */
export const SpanCard = memo(SpanCardView, sameCardSlice('span'));
