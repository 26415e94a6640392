import { Pressable, StyleSheet } from 'react-native';
import { colors, layout, radii, spacing } from '@/lib/theme';
import { Text } from '@/lib/ui/text';
import type { InputFlag } from './source-draft';

const order: InputFlag[] = ['measured', 'assumed', 'default'];
export const flagWords: Record<InputFlag, string> = {
  measured: 'Measured',
  assumed: 'Assumed',
  default: 'Default',
};

type FlagToggleProps = {
  field: string;
  flag: InputFlag;
  onChange: (flag: InputFlag) => void;
  testID?: string;
};

/** How a value was obtained, as a word; each tap moves it on (measured → assumed → default). */
export function FlagToggle({ field, flag, onChange, testID }: FlagToggleProps) {
  const next = order[(order.indexOf(flag) + 1) % order.length];
  return (
    <Pressable
      role="button"
      accessibilityRole="button"
      aria-label={`${field}: ${flagWords[flag]}. Tap for ${flagWords[next]}`}
      testID={testID}
      onPress={() => onChange(next)}
      style={({ pressed }) => [
        styles.pill,
        flag === 'measured' && styles.measured,
        pressed && styles.pressed,
      ]}
    >
      <Text variant="caption" style={styles.text}>
        {flagWords[flag]}
      </Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  pill: {
    minHeight: layout.touchTarget,
    minWidth: 88,
    paddingHorizontal: spacing.sm,
    borderRadius: radii.md,
    borderWidth: 1,
    borderColor: colors.lineStrong,
    borderStyle: 'dashed',
    alignItems: 'center',
    justifyContent: 'center',
    backgroundColor: colors.surfaceSunken,
  },
  measured: { borderStyle: 'solid', backgroundColor: colors.surface },
  pressed: { backgroundColor: colors.overlay },
  text: { fontWeight: '600' },
});
