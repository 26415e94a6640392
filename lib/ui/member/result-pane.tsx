import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { spacing } from '@/lib/theme';
import { CautionNote } from '@/lib/ui/caution-note';
import { Notice } from '@/lib/ui/notice';
import { CheckTable } from '@/lib/ui/result/check-table';
import { FactorsList, SupportList, TakedownList, WarningsList } from '@/lib/ui/result/detail-lists';
import { PrescriptiveCard } from '@/lib/ui/result/prescriptive-card';
import { VerdictBanner } from '@/lib/ui/result/verdict-banner';
import { Text } from '@/lib/ui/text';
import type { MemberCheckResult, PrescriptiveResult } from '@/shared/schemas/calc/member';
import type { FieldErrors } from './member-input';

type ResultPaneProps = {
  result: MemberCheckResult | null;
  prescriptive: PrescriptiveResult | null;
  errors: FieldErrors;
  /** Shown between the verdict and the details (diagrams). */
  diagrams?: ReactNode;
  /** Shown after the details (shortlist, framing list). */
  children?: ReactNode;
  notice?: ReactNode;
};

/** The result, top to bottom: prescriptive verdict (headers), overall verdict, checks, diagrams, details, caution. */
export function ResultPane({ result, prescriptive, errors, diagrams, children, notice }: ResultPaneProps) {
  const problems = Object.values(errors).flat();
  return (
    <View style={styles.pane} testID="result-pane">
      <Text variant="title">Result</Text>
      {notice}
      {result ? null : (
        <Notice tone="info" title="No result yet" testID="result-waiting">
          <Text>
            {problems.length
              ? `Fix ${problems.length === 1 ? 'one field' : `${problems.length} fields`} to see the check: ${problems[0]}`
              : 'Enter the clear span and at least one load source.'}
          </Text>
        </Notice>
      )}
      {result ? (
        <>
          {prescriptive ? <PrescriptiveCard verdict={prescriptive} /> : null}
          <VerdictBanner result={result} />
          <CheckTable result={result} />
          {diagrams}
          <SupportList result={result} />
          <TakedownList result={result} />
          <FactorsList result={result} />
          <WarningsList result={result} />
        </>
      ) : null}
      {children}
      <CautionNote />
    </View>
  );
}

const styles = StyleSheet.create({ pane: { gap: spacing.lg } });
