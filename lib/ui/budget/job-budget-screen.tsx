import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { ApiError } from '@/lib/api/client';
import { clientSummaryPath, jobBudgetCsvPath, sendJobBudget } from '@/lib/api/budgets';
import { formatDollars } from '@/lib/format/money';
import { useJobBudget } from '@/lib/hooks/use-budgets';
import { useMe } from '@/lib/hooks/use-me';
import { colors, spacing } from '@/lib/theme';
import { Button } from '../button';
import { Card } from '../card';
import { ErrorView } from '../error-view';
import { LinkButton } from '../link-button';
import { LoadingView } from '../loading-view';
import { Notice } from '../notice';
import { ChangeOrderNotice } from './change-order-notice';
import { Screen } from '../screen';
import { Text } from '../text';
import { TextField } from '../text-field';
import { downloadFile } from './download-file';

/** All members of a job summed; the lines as CSV; send it to a client (frozen, dated) and its summary PDF. */
export function JobBudgetScreen({ jobId }: { jobId: string }) {
  const { data: me } = useMe();
  const { data: budget, error, mutate } = useJobBudget(jobId);
  const [clientName, setClientName] = useState('');
  const [sendErrors, setSendErrors] = useState<string[]>([]);
  const [busy, setBusy] = useState(false);
  if (error) return <ErrorView error={error} onRetry={() => mutate()} />;
  if (!budget || !me) return <LoadingView />;
  const canSend = me.role === 'owner' || me.role === 'estimator';

  const send = async () => {
    setBusy(true);
    try {
      const sent = await sendJobBudget(jobId, { clientName });
      setSendErrors([]);
      await mutate();
      await downloadFile(clientSummaryPath(sent.id), 'budget-summary.pdf');
    } catch (e) {
      if (!(e instanceof ApiError)) throw e;
      setSendErrors(e.fields.clientName ?? [e.message]);
    } finally {
      setBusy(false);
    }
  };

  return (
    <Screen
      title={`Budget: ${budget.jobName}`}
      actions={
        <Button
          label="Download CSV"
          variant="secondary"
          onPress={() => downloadFile(jobBudgetCsvPath(jobId), 'job-budget.csv')}
          testID="job-csv"
        />
      }
    >
      <Notice tone="warning">{budget.caution}</Notice>
      <Card title="Job range">
        <Text variant="title" testID="job-range">
          {formatDollars(budget.lowCents)} to {formatDollars(budget.highCents)}
        </Text>
        {budget.changeOrders > 0 ? (
          <Text tone="danger" testID="job-change-orders">
            {budget.changeOrders === 1
              ? '1 change order: the engineer’s member differs from the budgeted one.'
              : `${budget.changeOrders} change orders: the engineer’s members differ from the budgeted ones.`}
          </Text>
        ) : null}
        {budget.members.map((m) => (
          <View key={m.memberId} style={styles.member}>
            <View style={styles.row}>
              <View style={styles.grow}>
                <Text variant="bodyStrong">{m.label}</Text>
                <Text variant="caption" tone="muted">
                  {m.range.lowLabel === m.range.highLabel
                    ? m.range.lowLabel
                    : `${m.range.lowLabel} to ${m.range.highLabel}`}
                  {m.design ? ` · engineer’s design, request ${m.design.requestNumber}` : ''}
                  {m.missingPrices ? ` · ${m.missingPrices} prices missing` : ''}
                </Text>
              </View>
              <Text>
                {formatDollars(m.range.lowCents)} to {formatDollars(m.range.highCents)}
              </Text>
              <LinkButton
                label="Open"
                variant="quiet"
                href={{
                  pathname: '/jobs/[jobId]/budget/[memberId]',
                  params: { jobId, memberId: m.memberId },
                }}
              />
            </View>
            {m.changeOrder ? <ChangeOrderNotice change={m.changeOrder} testID="job-change-order" /> : null}
          </View>
        ))}
        {budget.members.length === 0 ? (
          <Text tone="muted">No members yet: add the header or beam first.</Text>
        ) : null}
      </Card>
      {canSend ? (
        <Card title="Send to the client">
          <Text variant="caption" tone="muted">
            Freezes this budget with today’s date and downloads the client summary: scope, allowances,
            exclusions, the range and the caution. No unit costs, overhead or profit.
          </Text>
          <TextField
            label="Client’s name"
            value={clientName}
            onChangeText={setClientName}
            errors={sendErrors}
            testID="client-name"
          />
          <Button
            label="Send and download the summary"
            busy={busy}
            disabled={!clientName.trim() || budget.members.length === 0}
            onPress={send}
            testID="send-budget"
          />
        </Card>
      ) : null}
      {budget.sent.length ? (
        <Card title="Sent to the client">
          {budget.sent.map((s) => (
            <View key={s.id} style={styles.row}>
              <View style={styles.grow}>
                <Text variant="bodyStrong">{s.clientName}</Text>
                <Text variant="caption" tone="muted">
                  Sent {s.sentAt.slice(0, 10)} · {formatDollars(s.lowCents)} to {formatDollars(s.highCents)}
                </Text>
              </View>
              <Button
                label="Summary PDF"
                variant="quiet"
                onPress={() => downloadFile(clientSummaryPath(s.id), 'budget-summary.pdf')}
              />
            </View>
          ))}
        </Card>
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  member: { gap: spacing.xs },
  row: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    alignItems: 'center',
    gap: spacing.sm,
    paddingVertical: spacing.sm,
    borderBottomWidth: 1,
    borderBottomColor: colors.line,
  },
  grow: { flexGrow: 1, flexBasis: 180 },
});
