import { StyleSheet, View } from 'react-native';
import { budgetAllowances, budgetOldHouse, type BudgetChoicesInput } from '@/shared/schemas/budgets';
import { spacing } from '@/lib/theme';
import { Button } from '../button';
import { Card } from '../card';
import { ChoiceGroup } from '../choice-group';
import { Text } from '../text';

const allowanceWords: Record<(typeof budgetAllowances)[number], string> = {
  wiring: 'Wiring',
  plumbing: 'Plumbing',
  duct: 'A duct',
  gas: 'A gas line',
};
const oldHouseWords: Record<(typeof budgetOldHouse)[number], string> = {
  'knob-and-tube': 'Knob-and-tube wiring',
  'vent-stack': 'A vent stack',
  'asbestos-test': 'An asbestos test',
};

type Props = { choices: BudgetChoicesInput; canEdit: boolean; onChange: (next: BudgetChoicesInput) => void };

/** The estimator's choices: temporary walls built or shores rented, what moves out of the wall, old-house allowances. */
export function BudgetChoices({ choices, canEdit, onChange }: Props) {
  const toggle = <T extends string>(list: readonly T[], value: T) =>
    list.includes(value) ? list.filter((v) => v !== value) : [...list, value];
  return (
    <Card title="Choices">
      <ChoiceGroup
        label="Shoring"
        choices={[
          { value: 'built', label: 'Build temporary walls' },
          { value: 'rented', label: 'Rent adjustable shores' },
        ]}
        value={choices.shoring ?? 'built'}
        onChange={(shoring) => canEdit && onChange({ ...choices, shoring })}
      />
      <Text variant="label">Moved out of the wall (allowances)</Text>
      <View style={styles.toggles}>
        {budgetAllowances.map((kind) => (
          <Button
            key={kind}
            label={`${choices.allowances.includes(kind) ? '✓ ' : ''}${allowanceWords[kind]}`}
            variant={choices.allowances.includes(kind) ? 'primary' : 'secondary'}
            aria-pressed={choices.allowances.includes(kind)}
            disabled={!canEdit}
            onPress={() => onChange({ ...choices, allowances: toggle(choices.allowances, kind) })}
          />
        ))}
      </View>
      <Text variant="label">Old-house allowances</Text>
      <View style={styles.toggles}>
        {budgetOldHouse.map((kind) => (
          <Button
            key={kind}
            label={`${choices.oldHouse.includes(kind) ? '✓ ' : ''}${oldHouseWords[kind]}`}
            variant={choices.oldHouse.includes(kind) ? 'primary' : 'secondary'}
            aria-pressed={choices.oldHouse.includes(kind)}
            disabled={!canEdit}
            onPress={() => onChange({ ...choices, oldHouse: toggle(choices.oldHouse, kind) })}
          />
        ))}
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({ toggles: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm } });
