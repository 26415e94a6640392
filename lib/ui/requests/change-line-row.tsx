import { StyleSheet, View } from 'react-native';
import type { DiffLine } from '@/lib/requests/version-diff';
import { colors, radii, spacing } from '@/lib/theme';
import { Text } from '../text';

const SIDE_WORDS = { before: 'Was', after: 'Now' };

function Side({
  side,
  value,
  from,
  to,
}: {
  side: 'before' | 'after';
  value: string | null;
  from: number;
  to: number;
}) {
  return (
    <View style={[styles.side, side === 'before' ? styles.before : styles.after]}>
      <Text variant="caption" tone="muted">
        {SIDE_WORDS[side]} (version {side === 'before' ? from : to})
      </Text>
      <Text selectable>{value ?? '— none —'}</Text>
    </View>
  );
}

/**
 * One field of the comparison: its name, then the older value beside the newer (above it on a phone); an item
 * only one version has says "Added in version N" or "Removed in version N" with its value.
 */
export function ChangeLineRow({
  line,
  from,
  to,
  stacked,
}: {
  line: DiffLine;
  from: number;
  to: number;
  stacked: boolean;
}) {
  return (
    <View style={styles.row} testID="change-line">
      <Text variant="label">{line.field}</Text>
      {line.kind === 'changed' ? (
        <View style={[styles.pair, stacked && styles.pairStacked]}>
          <Side side="before" value={line.before} from={from} to={to} />
          <Side side="after" value={line.after} from={from} to={to} />
        </View>
      ) : (
        <View style={[styles.side, line.kind === 'added' ? styles.after : styles.before]}>
          <Text variant="caption" tone="muted">
            {line.kind === 'added' ? `Added in version ${to}` : `Removed in version ${to}`}
          </Text>
          <Text selectable style={line.kind === 'removed' ? styles.struck : undefined}>
            {line.kind === 'added' ? line.after : line.before}
          </Text>
        </View>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { gap: spacing.xs },
  pair: { flexDirection: 'row', gap: spacing.sm },
  pairStacked: { flexDirection: 'column' },
  side: { flex: 1, padding: spacing.sm, borderRadius: radii.sm, borderWidth: 1, gap: spacing.xxs },
  before: { backgroundColor: colors.surfaceSunken, borderColor: colors.line },
  after: { backgroundColor: colors.infoSoft, borderColor: colors.info },
  struck: { textDecorationLine: 'line-through' },
});
