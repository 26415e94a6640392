import { ScrollView, StyleSheet, View } from 'react-native';
import { colors, spacing } from '@/lib/theme';
import { Text } from '@/lib/ui/text';
import type { SpanTableResult } from '@/shared/schemas/calc/span-table';
import { GOVERNING_KEYS } from './governing-key';
import { spanBasisName, type SpanBasis } from './span-basis';
import { widthTitle } from './span-table-csv';

const SIZE_WIDTH = 124;
const CELL_WIDTH = 80;
const ROW_HEIGHT = 52;

/** "12-3" → "12 ft 3 in", for screen readers. */
const spoken = (spanText: string) => spanText.replace(/^(\d+)-(\d+)$/, '$1 ft $2 in');

/** "2-ply 1-3/4 x 9-1/2" → ["2-ply", "1-3/4 x 9-1/2"], so a long size breaks between plies and section. */
function sizeLines(label: string): [string | null, string] {
  const match = /^(\d+-ply) (.+)$/.exec(label);
  return match ? [match[1], match[2]] : [null, label];
}

/**
 * The table: one row per size, one column per tributary width, each span in ft-in over the key of the check
 * that governs it. The size column stays put while the spans scroll sideways on a narrow screen.
 */
export function SpanTableGrid({ result, basis }: { result: SpanTableResult; basis: SpanBasis }) {
  const name = spanBasisName(basis).toLowerCase();
  return (
    <View style={styles.frame} testID="span-table-grid">
      <View style={styles.sizeColumn}>
        <View style={[styles.cell, styles.head]}>
          <Text variant="label">Size</Text>
        </View>
        {result.rows.map((row, i) => {
          const [plies, section] = sizeLines(row.sizeLabel);
          return (
            <View key={row.sizeId} style={[styles.cell, i % 2 === 1 && styles.striped]}>
              {plies ? (
                <Text variant="caption" tone="muted">
                  {plies}
                </Text>
              ) : null}
              <Text variant="label" numberOfLines={1}>
                {section}
              </Text>
            </View>
          );
        })}
      </View>
      <ScrollView horizontal style={styles.scroll} contentContainerStyle={styles.scrollContent}>
        <View>
          <View style={styles.row}>
            {result.tributaryWidthsFt.map((ft, j) => (
              <View key={`${ft}-${j}`} style={[styles.cell, styles.head, styles.spanCell]}>
                <Text variant="label">{widthTitle(ft)}</Text>
              </View>
            ))}
          </View>
          {result.rows.map((row, i) => (
            <View key={row.sizeId} style={styles.row}>
              {row.cells.map((cell, j) => {
                const governs = GOVERNING_KEYS[cell.governedBy];
                return (
                  <View
                    key={`${cell.tributaryFt}-${j}`}
                    role="group"
                    style={[styles.cell, styles.spanCell, i % 2 === 1 && styles.striped]}
                    aria-label={`${row.sizeLabel} at ${widthTitle(cell.tributaryFt)} tributary: ${name} ${spoken(
                      cell.spanText,
                    )}, ${governs.word.toLowerCase()} governs`}
                  >
                    <Text variant="bodyStrong" numberOfLines={1} style={styles.span}>
                      {cell.spanText}
                    </Text>
                    <Text variant="caption" tone="muted">
                      {governs.key}
                    </Text>
                  </View>
                );
              })}
            </View>
          ))}
        </View>
      </ScrollView>
    </View>
  );
}

const styles = StyleSheet.create({
  frame: {
    flexDirection: 'row',
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.surface,
    alignSelf: 'stretch',
  },
  sizeColumn: { width: SIZE_WIDTH, borderRightWidth: 2, borderRightColor: colors.lineStrong },
  scroll: { flex: 1 },
  scrollContent: { flexGrow: 1 },
  row: { flexDirection: 'row' },
  cell: {
    height: ROW_HEIGHT,
    paddingHorizontal: spacing.sm,
    borderBottomWidth: 1,
    borderBottomColor: colors.line,
    justifyContent: 'center',
  },
  head: { backgroundColor: colors.surfaceSunken, borderBottomWidth: 2, borderBottomColor: colors.lineStrong },
  spanCell: { width: CELL_WIDTH, alignItems: 'flex-end' },
  striped: { backgroundColor: colors.paper },
  span: { fontVariant: ['tabular-nums'] },
});
