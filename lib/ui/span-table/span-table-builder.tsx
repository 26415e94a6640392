import { useDeferredValue, useMemo, useState } from 'react';
import { ScrollView, StyleSheet, useWindowDimensions, View } from 'react-native';
import { colors, layout, spacing } from '@/lib/theme';
import { FieldMessages } from '@/lib/ui/field-messages';
import { Notice } from '@/lib/ui/notice';
import { Text } from '@/lib/ui/text';
import { spanBasisOf } from './span-basis';
import { emptySpanTableDraft } from './span-table-draft';
import { SpanTableForm } from './span-table-form';
import { runSpanTable } from './span-table-input';
import { SpanTableResultView } from './span-table-result';

/** Form beside the table from this content width up, px. */
const TWO_PANE_MIN = 1000;
const FORM_PANE_WIDTH = 440;

/**
 * The span table builder: the person's loads, material and widths, and the table the engine solves for them
 * on this device as they type. Bad input shows a message at its field and no table.
 */
export function SpanTableBuilder() {
  const [draft, setDraft] = useState(emptySpanTableDraft);
  const deferred = useDeferredValue(draft);
  const run = useMemo(() => runSpanTable(deferred), [deferred]);
  const errors = run.ok ? {} : run.errors;
  const { width } = useWindowDimensions();
  const contentWidth = width >= layout.wideBreakpoint ? width - layout.sideNavWidth : width;
  const twoPane = contentWidth >= TWO_PANE_MIN;

  const intro = (
    <View style={styles.intro}>
      <Text variant="display">Span tables</Text>
      <Text tone="muted">
        The largest span each size carries under your loads, for each tributary width: uniform loads on a
        single span, solved by the same check as a member. A preliminary check, not your code’s table.
      </Text>
    </View>
  );
  const form = <SpanTableForm draft={draft} errors={errors} onChange={setDraft} />;
  const table = run.ok ? (
    <SpanTableResultView input={run.input} result={run.result} basis={spanBasisOf(run.result)} />
  ) : (
    <Notice tone="error" title="No table yet" testID="span-table-blocked">
      <Text>Nothing was computed: fix the fields marked in the form.</Text>
      <FieldMessages messages={errors._} />
    </Notice>
  );

  if (twoPane) {
    return (
      <View style={styles.root}>
        <ScrollView
          style={styles.formPane}
          contentContainerStyle={styles.paneContent}
          keyboardShouldPersistTaps="handled"
        >
          {intro}
          {form}
        </ScrollView>
        <ScrollView style={styles.resultPane} contentContainerStyle={styles.paneContent}>
          {table}
        </ScrollView>
      </View>
    );
  }
  return (
    <ScrollView
      style={styles.phone}
      contentContainerStyle={styles.paneContent}
      keyboardShouldPersistTaps="handled"
    >
      <View style={styles.column}>
        {intro}
        {form}
        {table}
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  root: { flex: 1, flexDirection: 'row', backgroundColor: colors.paper },
  phone: { flex: 1, backgroundColor: colors.paper },
  formPane: { width: FORM_PANE_WIDTH, flexGrow: 0, borderRightWidth: 1, borderRightColor: colors.line },
  resultPane: { flex: 1 },
  paneContent: { padding: spacing.lg, paddingBottom: spacing.xxxl, gap: spacing.lg },
  column: { width: '100%', maxWidth: layout.contentMaxWidth, alignSelf: 'center', gap: spacing.lg },
  intro: { gap: spacing.sm },
});
