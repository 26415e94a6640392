import { Notice } from '@/lib/ui/notice';
import { Text } from '@/lib/ui/text';
import type { PrescriptiveResult } from '@/shared/schemas/calc/member';

/** A header's prescriptive-path verdict, first in its result: the code table, or why an engineer is needed. */
export function PrescriptiveCard({ verdict }: { verdict: PrescriptiveResult }) {
  const covered = verdict.verdict === 'likely-covered';
  return (
    <Notice
      tone={covered ? 'info' : 'warning'}
      title={covered ? 'Likely covered by your code’s header table' : 'Engineer needed'}
      testID="prescriptive-verdict"
    >
      <Text>{verdict.message}</Text>
      {!covered && verdict.reasons.length > 1
        ? verdict.reasons.map((reason) => <Text key={reason}>• {reason}</Text>)
        : null}
      {verdict.notes.map((note) => (
        <Text key={note} variant="caption" tone="muted">
          {note}
        </Text>
      ))}
    </Notice>
  );
}
