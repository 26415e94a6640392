import { StyleSheet, useWindowDimensions, View } from 'react-native';
import { colors, radii, spacing } from '@/lib/theme';
import { Text } from '../text';
import { conflictRows, fieldLabel } from './conflict-rows';

/** The person's edit beside the server's record, field by field (side by side when there is room). */
export function ConflictCompare({ mine, server }: { mine: unknown; server: unknown }) {
  const { width } = useWindowDimensions();
  const rows = conflictRows(mine, server);
  const stacked = width < 420;
  if (rows.length === 0)
    return (
      <Text tone="muted">
        The server already has the same values as your change; either choice keeps them.
      </Text>
    );
  return (
    <View style={styles.table} testID="conflict-compare">
      {rows.map((row) => (
        <View key={row.path} style={styles.row}>
          <Text variant="label">{fieldLabel(row.path)}</Text>
          <View style={[styles.pair, stacked && styles.pairStacked]}>
            <View style={[styles.side, styles.mine]}>
              <Text variant="caption" tone="muted">
                Yours (this device)
              </Text>
              <Text testID={`conflict-mine-${row.path}`} selectable>
                {row.mine}
              </Text>
            </View>
            <View style={[styles.side, styles.server]}>
              <Text variant="caption" tone="muted">
                On the server now
              </Text>
              <Text testID={`conflict-server-${row.path}`} selectable>
                {row.server}
              </Text>
            </View>
          </View>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  table: { gap: spacing.md },
  row: { gap: spacing.xs },
  pair: { flexDirection: 'row', gap: spacing.sm },
  pairStacked: { flexDirection: 'column' },
  side: { flex: 1, padding: spacing.sm, borderRadius: radii.sm, borderWidth: 1, gap: spacing.xxs },
  mine: { backgroundColor: colors.infoSoft, borderColor: colors.info },
  server: { backgroundColor: colors.surfaceSunken, borderColor: colors.line },
});
