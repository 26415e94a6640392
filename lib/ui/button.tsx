import { ActivityIndicator, Pressable, StyleSheet, View, type PressableProps } from 'react-native';
import { colors, layout, radii, spacing } from '@/lib/theme';
import { Icon, type IconName } from './icon';
import { Text } from './text';

type Variant = 'primary' | 'secondary' | 'danger' | 'quiet';

type ButtonProps = Omit<PressableProps, 'children' | 'style'> & {
  label: string;
  variant?: Variant;
  icon?: IconName;
  busy?: boolean;
  /** Stretch to the width of the parent. */
  block?: boolean;
};

const look: Record<Variant, { bg: string; pressed: string; fg: string; border: string }> = {
  primary: { bg: colors.accent, pressed: colors.accentPressed, fg: colors.onAccent, border: colors.accent },
  secondary: { bg: colors.surface, pressed: colors.surfaceSunken, fg: colors.ink, border: colors.lineStrong },
  danger: { bg: colors.surface, pressed: colors.dangerSoft, fg: colors.danger, border: colors.danger },
  quiet: { bg: colors.none, pressed: colors.overlay, fg: colors.accent, border: colors.none },
};

/** A button at least 48 px tall. While `busy`, it shows a spinner and ignores presses. */
export function Button({
  label,
  variant = 'primary',
  icon,
  busy = false,
  block = false,
  disabled,
  ...rest
}: ButtonProps) {
  const v = look[variant];
  const inactive = busy || Boolean(disabled);
  return (
    <Pressable
      role="button"
      accessibilityRole="button"
      aria-label={label}
      aria-disabled={inactive}
      aria-busy={busy}
      disabled={inactive}
      // Flat style object: expo-router Link asChild merges the child style by object spread.
      style={StyleSheet.flatten([styles.base, block && styles.block, inactive && styles.inactive])}
      {...rest}
    >
      {({ pressed }) => (
        <View style={[styles.face, { backgroundColor: pressed ? v.pressed : v.bg, borderColor: v.border }]}>
          {busy ? <ActivityIndicator color={v.fg} /> : icon ? <Icon name={icon} color={v.fg} /> : null}
          <Text variant="bodyStrong" style={{ color: v.fg }}>
            {label}
          </Text>
        </View>
      )}
    </Pressable>
  );
}

const styles = StyleSheet.create({
  base: { alignSelf: 'flex-start', borderRadius: radii.md },
  block: { alignSelf: 'stretch' },
  face: {
    minHeight: layout.touchTarget,
    minWidth: layout.touchTarget,
    paddingHorizontal: spacing.lg,
    borderRadius: radii.md,
    borderWidth: 2,
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'center',
    gap: spacing.sm,
  },
  inactive: { opacity: 0.6 },
});
