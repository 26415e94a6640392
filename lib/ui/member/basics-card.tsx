import { memo } from 'react';
import { Card } from '@/lib/ui/card';
import { ChoiceGroup } from '@/lib/ui/choice-group';
import { TextField } from '@/lib/ui/text-field';
import type { MemberDraftState } from '@/lib/hooks/use-member-draft';
import type { MemberKind } from './member-draft';
import { sameCardSlice } from './card-memo';
import type { FieldErrors } from './member-input';

const kindChoices = [
  {
    value: 'header' as MemberKind,
    label: 'Header',
    description: 'Over a door or window in a wall that stays',
  },
  { value: 'beam' as MemberKind, label: 'Beam', description: 'Replacing a bearing wall, or carrying joists' },
];

/** What the member is and where it is. */
function BasicsCardView({ form, errors }: { form: MemberDraftState; errors: FieldErrors }) {
  const { draft, set } = form;
  return (
    <Card title="Member">
      <ChoiceGroup
        label="Kind"
        choices={kindChoices}
        value={draft.kind}
        onChange={set('kind')}
        testID="member-kind"
      />
      <TextField
        label="Label"
        value={draft.label}
        onChangeText={set('label')}
        errors={errors.label}
        testID="member-label"
      />
      <TextField
        label="Wall it belongs to"
        hint="E.g. “Kitchen–dining wall”."
        value={draft.wall}
        onChangeText={set('wall')}
        errors={errors.wall}
        testID="member-wall"
      />
    </Card>
  );
}

/** Basics inputs of the member editor; renders again only when its own fields change. */
export const BasicsCard = memo(BasicsCardView, sameCardSlice('basics'));
