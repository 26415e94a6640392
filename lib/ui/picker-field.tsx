import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors, layout, radii, spacing } from '@/lib/theme';
import type { Choice } from './choice-group';
import { FieldMessages } from './field-messages';
import { Icon } from './icon';
import { Text } from './text';

type PickerFieldProps<T extends string> = {
  label: string;
  hint?: string;
  choices: readonly Choice<T>[];
  value: T;
  onChange: (value: T) => void;
  errors?: string[];
  testID?: string;
};

/**
 * A field showing the chosen option; tapping it opens the list in place (large rows, the chosen one ticked)
 * and choosing closes it. For lists too long for a ChoiceGroup (materials, sizes).
 */
export function PickerField<T extends string>({
  label,
  hint,
  choices,
  value,
  onChange,
  errors,
  testID,
}: PickerFieldProps<T>) {
  const [open, setOpen] = useState(false);
  const chosen = choices.find((c) => c.value === value);
  return (
    <View style={styles.wrap}>
      <Text variant="label">{label}</Text>
      {hint ? (
        <Text variant="caption" tone="muted">
          {hint}
        </Text>
      ) : null}
      <Pressable
        role="button"
        accessibilityRole="button"
        aria-expanded={open}
        aria-label={`${label}: ${chosen?.label ?? 'none chosen'}`}
        testID={testID}
        onPress={() => setOpen(!open)}
        style={({ pressed }) => [
          styles.field,
          pressed && styles.pressed,
          errors?.length ? styles.invalid : null,
        ]}
      >
        <View style={styles.fieldText}>
          <Text variant="bodyStrong">{chosen?.label ?? 'Choose…'}</Text>
          {chosen?.description ? (
            <Text variant="caption" tone="muted">
              {chosen.description}
            </Text>
          ) : null}
        </View>
        <Text variant="label" tone="accent">
          {open ? 'Close' : 'Change'}
        </Text>
      </Pressable>
      {open ? (
        <View role="list" aria-label={label} style={styles.list}>
          {choices.map((choice) => {
            const selected = choice.value === value;
            return (
              <Pressable
                key={choice.value}
                role="button"
                aria-pressed={selected}
                aria-label={choice.label}
                testID={testID ? `${testID}-${choice.value}` : undefined}
                onPress={() => {
                  onChange(choice.value);
                  setOpen(false);
                }}
                style={({ pressed }) => [
                  styles.option,
                  selected && styles.selected,
                  pressed && styles.pressed,
                ]}
              >
                <View style={styles.fieldText}>
                  <Text variant={selected ? 'bodyStrong' : 'body'}>{choice.label}</Text>
                  {choice.description ? (
                    <Text variant="caption" tone="muted">
                      {choice.description}
                    </Text>
                  ) : null}
                </View>
                {selected ? <Icon name="check" color={colors.accent} /> : null}
              </Pressable>
            );
          })}
        </View>
      ) : null}
      <FieldMessages messages={errors} />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.xs, alignSelf: 'stretch' },
  field: {
    minHeight: layout.touchTarget,
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.sm,
    paddingHorizontal: spacing.md,
    paddingVertical: spacing.sm,
    borderWidth: 2,
    borderColor: colors.lineStrong,
    borderRadius: radii.md,
    backgroundColor: colors.surface,
  },
  invalid: { borderColor: colors.danger },
  fieldText: { flex: 1, gap: spacing.xxs },
  list: {
    borderWidth: 1,
    borderColor: colors.line,
    borderRadius: radii.md,
    backgroundColor: colors.surface,
    maxHeight: 360,
    overflow: 'scroll',
  },
  option: {
    minHeight: layout.touchTarget,
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.sm,
    paddingHorizontal: spacing.md,
    paddingVertical: spacing.sm,
    borderBottomWidth: 1,
    borderBottomColor: colors.line,
  },
  selected: { backgroundColor: colors.accentSoft },
  pressed: { backgroundColor: colors.surfaceSunken },
});
