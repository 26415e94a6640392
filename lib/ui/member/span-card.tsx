import { memo } from 'react';
import { Card } from '@/lib/ui/card';
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
    </Card>
  );
}

/** Span inputs of the member editor; renders again only when its own fields change. */
export const SpanCard = memo(
  SpanCardView,
  sameCardSlice(
    ['clearSpan', 'measuredTo', 'bearingLeft', 'bearingRight', 'flags'],
    ['clearSpan', 'bearingLeft', 'bearingRight'],
  ),
);
