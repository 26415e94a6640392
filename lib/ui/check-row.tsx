import { Pressable, StyleSheet, View } from 'react-native';
import { colors, iconSize, layout, radii, spacing } from '@/lib/theme';
import { Icon } from './icon';
import { Text } from './text';

type CheckRowProps = {
  label: string;
  hint?: string;
  value: boolean;
  onChange: (value: boolean) => void;
  testID?: string;
};

/** A checkbox drawn as a full-width tappable row; the tick, not colour alone, shows it is on. */
export function CheckRow({ label, hint, value, onChange, testID }: CheckRowProps) {
  return (
    <Pressable
      role="checkbox"
      accessibilityRole="checkbox"
      aria-checked={value}
      aria-label={label}
      testID={testID}
      onPress={() => onChange(!value)}
      style={({ pressed }) => [styles.row, pressed && styles.pressed]}
    >
      <View style={[styles.box, value && styles.boxOn]}>
        {value ? <Icon name="check" size={iconSize.sm} color={colors.onAccent} /> : null}
      </View>
      <View style={styles.text}>
        <Text variant="bodyStrong">{label}</Text>
        {hint ? (
          <Text variant="caption" tone="muted">
            {hint}
          </Text>
        ) : null}
      </View>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  row: {
    minHeight: layout.touchTarget,
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.md,
    paddingVertical: spacing.xs,
    borderRadius: radii.md,
  },
  pressed: { backgroundColor: colors.overlay },
  box: {
    width: 28,
    height: 28,
    borderRadius: radii.sm,
    borderWidth: 2,
    borderColor: colors.lineStrong,
    backgroundColor: colors.surface,
    alignItems: 'center',
    justifyContent: 'center',
  },
  boxOn: { backgroundColor: colors.accent, borderColor: colors.accent },
  text: { flex: 1, gap: spacing.xxs },
});
