import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { colors, spacing } from '@/lib/theme';
import { Text } from './text';

/** A spinner with a word, for screens waiting on their first answer. */
export function LoadingView({ label = 'Loading…' }: { label?: string }) {
  return (
    <View style={styles.wrap} role="status" aria-live="polite">
      <ActivityIndicator color={colors.accent} size="large" />
      <Text tone="muted">{label}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { flex: 1, alignItems: 'center', justifyContent: 'center', gap: spacing.md, padding: spacing.xl },
});
