import { useMemo } from 'react';
import { StyleSheet, View } from 'react-native';
import { DEFAULT_BEARING_IN, DEFLECTION_PRESETS } from '@/lib/calc';
import { spacing } from '@/lib/theme';
import { Button } from '@/lib/ui/button';
import { Card } from '@/lib/ui/card';
import { CautionNote, cautionText } from '@/lib/ui/caution-note';
import { Notice } from '@/lib/ui/notice';
import { Text } from '@/lib/ui/text';
import type { SpanTableInput, SpanTableResult } from '@/shared/schemas/calc/span-table';
import { downloadText, printPage } from './browser-output';
import { legendLines } from './governing-key';
import { PrintSheet } from './print-sheet';
import { printSheetModel } from './print-sheet-model';
import { spanBasisHeading, spanBasisName, type SpanBasis } from './span-basis';
import { spanTableCsv } from './span-table-csv';
import { SpanTableGrid } from './span-table-grid';

type ResultProps = { input: SpanTableInput; result: SpanTableResult; basis: SpanBasis };

/** A built span table: which span the numbers are, the table and its key, print and CSV, assumptions, caution. */
export function SpanTableResultView({ input, result, basis }: ResultProps) {
  const sheet = useMemo(() => printSheetModel(input, result, basis, cautionText), [input, result, basis]);
  const legend = legendLines(DEFLECTION_PRESETS[input.deflectionUse ?? 'floor']);
  const csvName = `span-table-${input.materialIds.join('-')}.csv`;
  return (
    <View style={styles.column} testID="span-table-result">
      <Card title={sheet.title}>
        <Text variant="bodyStrong">{spanBasisName(basis)} (ft-in) by size and tributary width</Text>
        <Text testID="span-basis">{spanBasisHeading(basis, input.bearingIn ?? DEFAULT_BEARING_IN)}</Text>
        {result.rows.length > 0 ? (
          <>
            <Text variant="caption" tone="muted">
              Columns are tributary widths. On a narrow screen, swipe the spans sideways.
            </Text>
            <SpanTableGrid result={result} basis={basis} />
            <View style={styles.legend} testID="span-legend">
              <Text variant="label">Key: what limits the span</Text>
              {legend.map((line) => (
                <Text key={line} variant="caption">
                  {line}
                </Text>
              ))}
            </View>
          </>
        ) : (
          <Notice tone="info" title="No sizes">
            The chosen material has no sizes in the chosen plies.
          </Notice>
        )}
        {result.rows.length > 0 && (printPage || downloadText) ? (
          <View style={styles.actions}>
            {printPage ? (
              <Button label="Print" variant="secondary" onPress={printPage} testID="span-print" />
            ) : null}
            {downloadText ? (
              <Button
                label="Download CSV"
                variant="secondary"
                onPress={() => downloadText?.(csvName, spanTableCsv(result, basis), 'text/csv')}
                testID="span-csv"
              />
            ) : null}
          </View>
        ) : null}
      </Card>
      {result.warnings.length ? (
        <Notice tone="warning" title="Warnings" testID="span-warnings">
          {result.warnings.map((w) => (
            <Text key={w}>{w}</Text>
          ))}
        </Notice>
      ) : null}
      <CautionNote />
      <Card title="Assumptions">
        {sheet.assumptions.map((a) => (
          <View key={a.label} style={styles.assumption}>
            <Text variant="label">{a.label}</Text>
            <Text>{a.value}</Text>
          </View>
        ))}
        <Text variant="label">Notes</Text>
        {result.notes.map((note) => (
          <Text key={note} variant="caption">
            {note}
          </Text>
        ))}
        <Text variant="label">Sources</Text>
        {result.sources.map((source) => (
          <Text key={source} variant="caption" tone="muted">
            {source}
          </Text>
        ))}
      </Card>
      {result.rows.length > 0 ? <PrintSheet model={sheet} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  column: { gap: spacing.lg },
  legend: { gap: spacing.xxs },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  assumption: { gap: spacing.xxs },
});
