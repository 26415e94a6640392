import { Pressable, StyleSheet, View } from 'react-native';
import { colors, iconSize, layout, radii, spacing } from '@/lib/theme';
import { FieldMessages } from './field-messages';
import { Icon } from './icon';
import { Text } from './text';

export type Choice<T extends string> = { value: T; label: string; description?: string };

type ChoiceGroupProps<T extends string> = {
  label: string;
  choices: readonly Choice<T>[];
  value: T;
  onChange: (value: T) => void;
  errors?: string[];
  testID?: string;
};

/** A radio group drawn as large tappable options; the chosen one carries a tick as well as the accent. */
export function ChoiceGroup<T extends string>({
  label,
  choices,
  value,
  onChange,
  errors,
  testID,
}: ChoiceGroupProps<T>) {
  const wide = choices.every((c) => !c.description);
  return (
    <View style={styles.wrap}>
      <Text variant="label" nativeID={testID ? `${testID}-label` : undefined}>
        {label}
      </Text>
      <View
        role="radiogroup"
        aria-label={label}
        testID={testID}
        style={[styles.options, wide && styles.inline]}
      >
        {choices.map((choice) => {
          const selected = choice.value === value;
          return (
            <Pressable
              key={choice.value}
              role="radio"
              accessibilityRole="radio"
              aria-checked={selected}
              aria-label={choice.label}
              testID={testID ? `${testID}-${choice.value}` : undefined}
              onPress={() => onChange(choice.value)}
              style={({ pressed }) => [styles.option, selected && styles.selected, pressed && styles.pressed]}
            >
              <View style={[styles.dot, selected && styles.dotSelected]}>
                {selected ? <Icon name="check" size={iconSize.sm} color={colors.onAccent} /> : null}
              </View>
              <View style={styles.optionText}>
                <Text variant="bodyStrong">{choice.label}</Text>
                {choice.description ? (
                  <Text variant="caption" tone="muted">
                    {choice.description}
                  </Text>
                ) : null}
              </View>
            </Pressable>
          );
        })}
      </View>
      <FieldMessages messages={errors} />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.xs, alignSelf: 'stretch' },
  options: { gap: spacing.sm },
  inline: { flexDirection: 'row', flexWrap: 'wrap' },
  option: {
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
  selected: { borderColor: colors.accent, backgroundColor: colors.accentSoft },
  pressed: { backgroundColor: colors.surfaceSunken },
  dot: {
    width: 24,
    height: 24,
    borderRadius: radii.pill,
    borderWidth: 2,
    borderColor: colors.lineStrong,
    alignItems: 'center',
    justifyContent: 'center',
  },
  dotSelected: { backgroundColor: colors.accent, borderColor: colors.accent },
  optionText: { flexShrink: 1, gap: spacing.xxs },
});
