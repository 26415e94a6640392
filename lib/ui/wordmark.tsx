import { StyleSheet, View } from 'react-native';
import { Path, Svg } from './line-svg';
import { colors, spacing } from '@/lib/theme';
import { Text } from './text';

/** Three streams joining into one: the Tributary mark. */
export function Mark({ size = 28, color = colors.accent }: { size?: number; color?: string }) {
  return (
    <Svg width={size} height={size} viewBox="0 0 32 32" fill="none" aria-hidden>
      <Path d="M3 6c7 0 9 10 16 10" stroke={color} strokeWidth={2.5} strokeLinecap="round" />
      <Path d="M3 16h16" stroke={color} strokeWidth={2.5} strokeLinecap="round" />
      <Path d="M3 26c7 0 9-10 16-10" stroke={color} strokeWidth={2.5} strokeLinecap="round" />
      <Path d="M19 16h10" stroke={color} strokeWidth={5} strokeLinecap="round" />
    </Svg>
  );
}

/** The product's name beside its mark. */
export function Wordmark({ size = 'md' }: { size?: 'md' | 'lg' }) {
  const large = size === 'lg';
  return (
    <View style={styles.row} aria-label="Tributary" role="img">
      <Mark size={large ? 40 : 28} />
      <Text variant={large ? 'display' : 'title'} style={styles.word} role="none" aria-level={undefined}>
        Tributary
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  word: { letterSpacing: -0.4 },
});
