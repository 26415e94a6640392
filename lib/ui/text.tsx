import { Text as RNText, type TextProps as RNTextProps } from 'react-native';
import { colors, typeScale, type TypeVariant } from '@/lib/theme';

type Tone = 'ink' | 'muted' | 'accent' | 'danger' | 'onAccent';

const toneColor: Record<Tone, string> = {
  ink: colors.ink,
  muted: colors.inkMuted,
  accent: colors.accent,
  danger: colors.danger,
  onAccent: colors.onAccent,
};

export type TextProps = RNTextProps & { variant?: TypeVariant; tone?: Tone };

/** Text in the Tributary type scale. Headings get the matching accessibility role. */
export function Text({ variant = 'body', tone = 'ink', style, ...rest }: TextProps) {
  const isHeading = variant === 'display' || variant === 'title' || variant === 'heading';
  return (
    <RNText
      role={isHeading ? 'heading' : undefined}
      aria-level={variant === 'display' ? 1 : variant === 'title' ? 2 : isHeading ? 3 : undefined}
      style={[typeScale[variant], { color: toneColor[tone] }, style]}
      {...rest}
    />
  );
}
