import { memo } from 'react';
import { Card } from '@/lib/ui/card';
import { CheckRow } from '@/lib/ui/check-row';
import { ChoiceGroup } from '@/lib/ui/choice-group';
import type { MemberDraftState } from '@/lib/hooks/use-member-draft';
import type { MeasuredTo } from './member-draft';
import { sameCardSlice } from './card-memo';
import type { FieldErrors } from './member-input';
import { MeasureField } from './measure-field';

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
  const { draft, set, setFlag } = form;
  return (
    <Card title="Span and bearing">
      <MeasureField
        label="Clear span"
        hint={`Between the faces of the supports: 13' 6-3/8", 13-6-3/8, 13 6 3/8, 162 in or 4.1 m.`}
        unit="ft"
        tape
        value={draft.clearSpan}
        onChangeText={set('clearSpan')}
        errors={errors.clearSpan}
        flag={draft.flags.clearSpan ?? 'default'}
        onFlag={(f) => setFlag('clearSpan', f)}
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
        value={draft.bearingLeft}
        onChangeText={set('bearingLeft')}
        errors={errors.bearingLeft}
        flag={draft.flags.bearingLeft ?? 'default'}
        onFlag={(f) => setFlag('bearingLeft', f)}
        testID="bearing-left"
      />
      <MeasureField
        label="Bearing length, right end"
        unit="in"
        value={draft.bearingRight}
        onChangeText={set('bearingRight')}
        errors={errors.bearingRight}
        flag={draft.flags.bearingRight ?? 'default'}
        onFlag={(f) => setFlag('bearingRight', f)}
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
            value={draft.secondSpan}
            onChangeText={set('secondSpan')}
            errors={errors.secondSpan}
            flag={draft.flags.secondSpan ?? 'default'}
            onFlag={(f) => setFlag('secondSpan', f)}
            testID="second-span"
          />
          <MeasureField
            label="Bearing on the centre post"
            hint="3-1/2 in is a 4x4 post's face."
            unit="in"
            value={draft.centreBearing}
            onChangeText={set('centreBearing')}
            errors={errors.centreBearing}
            flag={draft.flags.centreBearing ?? 'default'}
            onFlag={(f) => setFlag('centreBearing', f)}
            testID="centre-bearing"
          />
        </>
      ) : null}
      <MeasureField
        label="Overhang past the left support (optional)"
        hint="From the support's face to the tip. Load positions are then measured from the tip."
        unit="ft"
        value={draft.overhangLeft}
        onChangeText={set('overhangLeft')}
        errors={errors.overhangLeft}
        flag={draft.flags.overhangLeft ?? 'default'}
        onFlag={(f) => setFlag('overhangLeft', f)}
        testID="overhang-left"
      />
      <MeasureField
        label="Overhang past the right support (optional)"
        unit="ft"
        value={draft.overhangRight}
        onChangeText={set('overhangRight')}
        errors={errors.overhangRight}
        flag={draft.flags.overhangRight ?? 'default'}
        onFlag={(f) => setFlag('overhangRight', f)}
        testID="overhang-right"
      />
    </Card>
  );
}

/** Span inputs of the member editor; renders again only when its own fields change. */
export const SpanCard = memo(
  SpanCardView,
  sameCardSlice(
    [
      'clearSpan',
      'measuredTo',
      'bearingLeft',
      'bearingRight',
      'overhangLeft',
      'overhangRight',
      'continuous',
      'secondSpan',
      'centreBearing',
      'flags',
    ],
    [
      'clearSpan',
      'bearingLeft',
      'bearingRight',
      'overhangLeft',
      'overhangRight',
      'secondSpan',
      'centreBearing',
    ],
  ),
);
