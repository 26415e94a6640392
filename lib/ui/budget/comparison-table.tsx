import { StyleSheet, View } from 'react-native';
import { formatNumber } from '@/lib/format';
import { formatDollars } from '@/lib/format/money';
import { colors, spacing } from '@/lib/theme';
import type { MemberBudgetView } from '@/shared/schemas/budgets';
import { Text } from '../text';

/** Every priced size in a table: the cheapest passing one and the preliminary one said in words. */
export function ComparisonTable({ rows }: { rows: MemberBudgetView['comparison'] }) {
  return (
    <View role="table" testID="comparison-table">
      {rows.map((row) => (
        <View
          key={row.id}
          role="row"
          style={[styles.row, row.cheapest && styles.cheapest]}
          testID={`compare-${row.id}`}
        >
          <View style={styles.size}>
            <Text variant="bodyStrong">{row.sizeLabel}</Text>
            <Text variant="caption" tone="muted">
              {[
                row.cheapest ? 'Cheapest that passes' : null,
                row.preliminary ? 'Preliminary size' : null,
                row.passes ? `passes at ${formatNumber(row.utilization, 2)}` : 'fails the check',
                row.supply === 'special-order' ? 'special order' : null,
                row.complete ? null : 'prices missing',
              ]
                .filter(Boolean)
                .join(' · ')}
            </Text>
          </View>
          <Text variant="bodyStrong">{formatDollars(row.totalCents)}</Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  row: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.md,
    paddingVertical: spacing.sm,
    paddingHorizontal: spacing.sm,
    borderBottomWidth: 1,
    borderBottomColor: colors.line,
  },
  cheapest: { backgroundColor: colors.accentSoft },
  size: { flex: 1, gap: spacing.xxs },
});
