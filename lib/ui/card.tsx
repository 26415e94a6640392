import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '@/lib/theme';
import { Text } from './text';

/** A bordered surface grouping related content, with an optional heading. */
export function Card({ title, children, testID }: { title?: string; children: ReactNode; testID?: string }) {
  return (
    <View style={styles.card} testID={testID}>
      {title ? <Text variant="heading">{title}</Text> : null}
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  card: {
    backgroundColor: colors.surface,
    borderColor: colors.line,
    borderWidth: 1,
    borderRadius: radii.lg,
    padding: spacing.lg,
    gap: spacing.md,
    alignSelf: 'stretch',
  },
});
