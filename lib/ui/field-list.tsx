import { StyleSheet, View } from 'react-native';
import { colors, spacing } from '@/lib/theme';
import { Text } from './text';

export type FieldListItem = { label: string; value: string };

/** Label and value pairs, one under the other on a phone. */
export function FieldList({ items }: { items: FieldListItem[] }) {
  return (
    <View style={styles.list}>
      {items.map((item, index) => (
        <View key={item.label} style={[styles.row, index > 0 && styles.divider]}>
          <Text variant="label" tone="muted" style={styles.label}>
            {item.label}
          </Text>
          <Text style={styles.value}>{item.value}</Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { alignSelf: 'stretch' },
  row: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    columnGap: spacing.lg,
    rowGap: spacing.xxs,
    paddingVertical: spacing.md,
  },
  divider: { borderTopWidth: 1, borderTopColor: colors.line },
  label: { width: 200, maxWidth: '100%' },
  value: { flex: 1, minWidth: 180 },
});
