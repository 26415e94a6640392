import { View } from 'react-native';
import { VictoryAxis, VictoryBar, VictoryChart } from 'victory-native';
import { formatDollars } from '@/lib/format/money';
import { colors, fonts } from '@/lib/theme';
import type { MemberBudgetView } from '@/shared/schemas/budgets';
import { Text } from '../text';

type Row = MemberBudgetView['comparison'][number];

const mark = (row: Row) => (row.cheapest ? '★ ' : '') + (row.preliminary ? '▸ ' : '');

/**
 * Every priced size as a horizontal bar (victory-native, loaded with this route only). The cheapest
 * passing size carries a star and the accent, the preliminary size a pointer: never colour alone.
 */
export default function ComparisonChart({ rows, width }: { rows: readonly Row[]; width: number }) {
  // A horizontal chart puts x = 1 at the bottom: the first row (shallowest) goes on top.
  const data = rows.map((row, i) => ({
    x: rows.length - i,
    y: row.totalCents / 100,
    tick: `${mark(row)}${row.sizeLabel}`,
    label: formatDollars(row.totalCents),
    fill: row.cheapest ? colors.accent : row.passes ? colors.lineStrong : colors.danger,
  }));
  const height = 48 + rows.length * 34;
  // On a phone the chart is narrow: fewer money ticks, so their labels never run into each other.
  const narrow = width < 500;
  return (
    <View testID="comparison-chart" aria-label="Budget by size, chart">
      <Text variant="caption" tone="muted">
        ★ cheapest that passes · ▸ preliminary size
      </Text>
      <VictoryChart
        horizontal
        width={width}
        height={height}
        domainPadding={{ x: 18 }}
        padding={{ top: 12, bottom: 36, left: narrow ? 132 : 150, right: 64 }}
      >
        <VictoryAxis
          tickValues={data.map((d) => d.x)}
          tickFormat={data.map((d) => d.tick)}
          style={{
            tickLabels: { fontFamily: fonts.regular, fontSize: 11, fill: colors.ink },
            axis: { stroke: colors.line },
          }}
        />
        <VictoryAxis
          dependentAxis
          tickCount={narrow ? 2 : 4}
          tickFormat={(t: number) => formatDollars(t * 100)}
          style={{
            tickLabels: { fontFamily: fonts.regular, fontSize: 10, fill: colors.inkMuted },
            grid: { stroke: colors.line },
          }}
        />
        <VictoryBar
          data={data}
          barWidth={18}
          style={{ data: { fill: ({ datum }) => (datum as { fill: string }).fill } }}
        />
      </VictoryChart>
    </View>
  );
}
