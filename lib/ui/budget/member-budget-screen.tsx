import { lazy, Suspense, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useSWRConfig } from 'swr';
import { memberBudgetCsvPath, saveMemberBudget } from '@/lib/api/budgets';
import { keys } from '@/lib/api/keys';
import { formatDollars } from '@/lib/format/money';
import { useMemberBudget } from '@/lib/hooks/use-budgets';
import { useMe } from '@/lib/hooks/use-me';
import { spacing } from '@/lib/theme';
import type { BudgetChoicesInput, LineOverrideInput, MemberBudgetView } from '@/shared/schemas/budgets';
import { Button } from '../button';
import { Card } from '../card';
import { Notice } from '../notice';
import { ChangeOrderNotice } from './change-order-notice';
import { ErrorView } from '../error-view';
import { LinkButton } from '../link-button';
import { LoadingView } from '../loading-view';
import { Screen } from '../screen';
import { Text } from '../text';
import { BudgetChoices } from './budget-choices';
import { BudgetLineRow } from './budget-line-row';
import { ComparisonTable } from './comparison-table';
import { downloadFile } from './download-file';
import { groupWords } from './group-words';

// The chart library loads with this screen only.
const ComparisonChart = lazy(() => import('./comparison-chart'));

/** A member's budget: the range, the sizes compared, the scenarios, the crew days and every line. */
export function MemberBudgetScreen({ jobId, memberId }: { jobId: string; memberId: string }) {
  const { data: me } = useMe();
  const { data: budget, error, mutate } = useMemberBudget(memberId);
  const { mutate: mutateKey } = useSWRConfig();
  const [width, setWidth] = useState(320);
  if (error) return <ErrorView error={error} onRetry={() => mutate()} />;
  if (!budget || !me) return <LoadingView />;
  const canEdit = me.role === 'owner' || me.role === 'estimator';

  const save = async (choices: BudgetChoicesInput, overrides: Record<string, LineOverrideInput>) => {
    const saved = await saveMemberBudget(memberId, { choices, overrides });
    await mutate(saved, { revalidate: false });
    await mutateKey(keys.jobBudget(me.activeOrgId, jobId));
  };
  const override = async (id: string, change: LineOverrideInput | null) => {
    const overrides = { ...budget.overrides } as Record<string, LineOverrideInput>;
    if (change) overrides[id] = change;
    else delete overrides[id];
    await save(budget.choices, overrides);
  };

  return (
    <Screen
      title={`Budget: ${budget.memberLabel}`}
      actions={
        <View style={styles.actions}>
          <LinkButton
            label="Job budget"
            variant="secondary"
            href={{ pathname: '/jobs/[jobId]/budget', params: { jobId } }}
          />
          <Button
            label="Download CSV"
            variant="secondary"
            onPress={() => downloadFile(memberBudgetCsvPath(memberId), 'member-budget.csv')}
            testID="member-csv"
          />
        </View>
      }
    >
      <Notice tone="warning">{budget.caution}</Notice>
      <Card title="Budget range" testID="budget-range">
        <Text variant="title" testID="budget-range-text">
          {formatDollars(budget.range.lowCents)} to {formatDollars(budget.range.highCents)}
        </Text>
        <Text tone="muted">{budget.range.basis}.</Text>
        <Text testID="budget-total">
          {budget.design
            ? `At the engineer’s member (${budget.design.label}): `
            : `At the preliminary size (${budget.sizeLabel}): `}
          {formatDollars(budget.totalCents, true)}
        </Text>
        {budget.design && budget.preliminaryRange ? (
          <Text variant="caption" tone="muted" testID="budget-preliminary-range">
            Budgeted at the preliminary size ({budget.sizeLabel}, superseded):{' '}
            {formatDollars(budget.preliminaryRange.lowCents)} to{' '}
            {formatDollars(budget.preliminaryRange.highCents)}
          </Text>
        ) : null}
        {budget.changeOrder ? <ChangeOrderNotice change={budget.changeOrder} /> : null}
        {budget.missingPrices.length ? (
          <Notice tone="error" title="Prices missing">
            {budget.missingPrices.join(', ')}: add them to the price book.
          </Notice>
        ) : null}
        {budget.stalePrices.length ? (
          <Notice tone="warning">{budget.stalePrices.length} prices used are stale.</Notice>
        ) : null}
      </Card>
      <Card title="Sizes compared">
        <View onLayout={(e) => setWidth(Math.max(280, e.nativeEvent.layout.width))}>
          <Suspense fallback={<LoadingView label="Loading the chart…" />}>
            <ComparisonChart rows={budget.comparison} width={width} />
          </Suspense>
        </View>
        <ComparisonTable rows={budget.comparison} />
      </Card>
      <Scenarios budget={budget} />
      <BudgetChoices
        choices={budget.choices}
        canEdit={canEdit}
        onChange={(choices) => save(choices, budget.overrides as Record<string, LineOverrideInput>)}
      />
      <Card title="Crew days">
        <Text>
          {budget.schedule.framingDays} framing days, {budget.schedule.returnTrips} return trips for finishes;
          the house stays shored {budget.schedule.shoredDays} days.
        </Text>
        {budget.schedule.waiting.map((w) => (
          <Text key={w.label} tone="muted">
            {w.label}: {w.days} days
          </Text>
        ))}
      </Card>
      <Card title="Every line">
        {Object.entries(groupWords).map(([group, words]) => {
          const lines = budget.lines.filter((l) => l.group === group);
          if (!lines.length) return null;
          return (
            <View key={group} style={styles.group}>
              <Text variant="label">{words}</Text>
              {lines.map((line) => (
                <BudgetLineRow
                  key={`${line.id}-${line.amountCents}`}
                  line={line}
                  canEdit={canEdit}
                  onOverride={override}
                />
              ))}
            </View>
          );
        })}
        <Text variant="bodyStrong">Total {formatDollars(budget.totalCents, true)}</Text>
      </Card>
      {budget.notes.map((note) => (
        <Text key={note} variant="caption" tone="muted">
          {note}
        </Text>
      ))}
    </Screen>
  );
}

function Scenarios({ budget }: { budget: MemberBudgetView }) {
  return (
    <Card title="Scenarios">
      {budget.scenarios.map((s) => (
        <View key={s.id} style={styles.scenario} testID={`scenario-${s.id}`}>
          <View style={styles.grow}>
            <Text variant="bodyStrong">{s.label}</Text>
            <Text variant="caption" tone="muted">
              {s.note}
            </Text>
          </View>
          <Text>
            {s.deltaCents >= 0 ? '+' : ''}
            {formatDollars(s.deltaCents)}
          </Text>
        </View>
      ))}
    </Card>
  );
}

const styles = StyleSheet.create({
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  group: { gap: spacing.xs },
  scenario: { flexDirection: 'row', gap: spacing.md, alignItems: 'center' },
  grow: { flex: 1 },
});
