import { memo } from 'react';
import { Text as RNText, StyleSheet, type TextProps as RNTextProps } from 'react-native';
import { colors, typeScale, type TypeVariant } from '@/lib/theme';

type Tone = 'ink' | 'muted' | 'accent' | 'danger' | 'onAccent';

// Static styles: an inline colour object would be new on every render, and react-native-web resolves each
// new style object again (the result column renders dozens of texts per keystroke).
const toneStyles = StyleSheet.create({
  ink: { color: colors.ink },
  muted: { color: colors.inkMuted },
  accent: { color: colors.accent },
  danger: { color: colors.danger },
  onAccent: { color: colors.onAccent },
}) satisfies Record<Tone, unknown>;

const variantStyles = StyleSheet.create(typeScale);

export type TextProps = RNTextProps & { variant?: TypeVariant; tone?: Tone };

function TextView({ variant = 'body', tone = 'ink', style, ...rest }: TextProps) {
  const isHeading = variant === 'display' || variant === 'title' || variant === 'heading';
  return (
    <RNText
      role={isHeading ? 'heading' : undefined}
      aria-level={variant === 'display' ? 1 : variant === 'title' ? 2 : isHeading ? 3 : undefined}
      style={[variantStyles[variant], toneStyles[tone], style]}
      {...rest}
    />
  );
}

/** Equal by identity, or two arrays (words with numbers put in, a style list) equal item by item. */
const sameItem = (a: unknown, b: unknown) =>
  a === b || (Array.isArray(a) && Array.isArray(b) && a.length === b.length && a.every((v, i) => v === b[i]));

const sameText = (a: TextProps, b: TextProps) => {
  const keys = Object.keys(a) as (keyof TextProps)[];
  return keys.length === Object.keys(b).length && keys.every((k) => sameItem(a[k], b[k]));
};

/**
 * Text in the Tributary type scale. Headings get the matching accessibility role. Memoised: a text whose
 * words and style are unchanged is not rendered again with the rest of its card ("Demand {x} psi" makes a
 * new children array each render, so arrays compare item by item).
 */
export const Text = memo(TextView, sameText);
