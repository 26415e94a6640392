import { useDeferredValue, useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { formatFtIn, formatLb, formatNumber, formatPlf } from '@/lib/format';
import { colors, spacing } from '@/lib/theme';
import { Button } from '@/lib/ui/button';
import { Card } from '@/lib/ui/card';
import { CheckRow } from '@/lib/ui/check-row';
import { ChoiceGroup } from '@/lib/ui/choice-group';
import { FieldMessages } from '@/lib/ui/field-messages';
import { checkName } from '@/lib/ui/result/check-names';
import { RatioBar } from '@/lib/ui/result/ratio-bar';
import { Text } from '@/lib/ui/text';
import { TextField } from '@/lib/ui/text-field';
import type { MemberCheckInput } from '@/shared/schemas/calc/member';
import type { ShortlistEntry } from '@/shared/schemas/calc/shortlist';
import { familyChoices } from './choices';
import {
  defaultShortlistFilters,
  runShortlist,
  type ShortlistFilters,
  type ShortlistSort,
} from './shortlist-query';

const sortChoices: { value: ShortlistSort; label: string }[] = [
  { value: 'shallowest', label: 'Shallowest' },
  { value: 'lightest', label: 'Lightest' },
  { value: 'fewest-plies', label: 'Fewest plies' },
];

type ShortlistPanelProps = {
  input: MemberCheckInput;
  /** Joist depth of a flush member, in: the default depth limit. */
  joistDepthIn?: number;
  onChoose: (entry: ShortlistEntry) => void;
  chosen: { materialId: string; sizeId: string };
};

function EntryRow({
  entry,
  chosen,
  onChoose,
}: {
  entry: ShortlistEntry;
  chosen: boolean;
  onChoose: () => void;
}) {
  return (
    <View style={styles.entry} testID={`shortlist-${entry.materialId}-${entry.sizeId}`}>
      <View style={styles.entryHead}>
        <View style={styles.grow}>
          <Text variant="bodyStrong">
            {entry.sizeLabel} · {entry.materialLabel}
          </Text>
          <Text variant="caption" tone="muted">
            {formatNumber(entry.dIn, 3)} in deep · {formatPlf(entry.weightPlf, 1)} · heaviest piece{' '}
            {formatLb(entry.pieceWeightLb)} · {formatNumber(entry.utilization * 100, 0)}% used (
            {checkName(entry.governingCheck)}){entry.failing ? ` · fails: ${entry.failing}` : ''}
          </Text>
        </View>
        {entry.failing ? null : (
          <Button
            label={chosen ? 'Chosen' : 'Choose'}
            icon={chosen ? 'check' : undefined}
            variant={chosen ? 'secondary' : 'primary'}
            onPress={onChoose}
            testID={`choose-${entry.materialId}-${entry.sizeId}`}
          />
        )}
      </View>
      <RatioBar ratio={entry.utilization} />
    </View>
  );
}

/** "Find sizes": the shortlist for this member's loads with fit filters and a sort; choosing sets the size. */
export function ShortlistPanel({ input, joistDepthIn, onChoose, chosen }: ShortlistPanelProps) {
  const [filters, setFilters] = useState<ShortlistFilters>(() => ({
    ...defaultShortlistFilters(),
    maxDepth: joistDepthIn ? String(joistDepthIn) : '',
  }));
  const [open, setOpen] = useState(false);
  // The shortlist checks every size: once open it follows the typing a beat behind, never holding up the
  // check; closed, it takes no part in a keystroke (no second, deferred render).
  const deferredInput = useDeferredValue(open ? input : null);
  const run = useMemo(
    () => (open ? runShortlist(deferredInput ?? input, filters) : null),
    [open, deferredInput, filters],
  );
  const set =
    <K extends keyof ShortlistFilters>(key: K) =>
    (value: ShortlistFilters[K]) =>
      setFilters((f) => ({ ...f, [key]: value }));
  if (!run)
    return (
      <Card title="Find sizes" testID="shortlist">
        <Text tone="muted">
          Every size of every material checked for these loads, filtered by what fits and sorted your way.
        </Text>
        <Button label="Find sizes" icon="chevronRight" onPress={() => setOpen(true)} testID="find-sizes" />
      </Card>
    );
  const errors = run.ok ? {} : run.errors;
  return (
    <Card title="Find sizes" testID="shortlist">
      <View style={styles.row}>
        {familyChoices.map((f) => (
          <View key={f.value} style={styles.family}>
            <CheckRow
              label={f.label}
              value={filters.families.includes(f.value)}
              onChange={(on) =>
                set('families')(
                  on ? [...filters.families, f.value] : filters.families.filter((x) => x !== f.value),
                )
              }
              testID={`shortlist-family-${f.value}`}
            />
          </View>
        ))}
      </View>
      <FieldMessages messages={errors.families} />
      <View style={styles.row}>
        <View style={styles.cell}>
          <TextField
            label="Deepest that fits"
            unit="in"
            hint={
              input.mount === 'flush' ? 'The joist depth for a flush beam.' : 'Headroom for a dropped one.'
            }
            value={filters.maxDepth}
            onChangeText={set('maxDepth')}
            errors={errors.maxDepth}
            testID="filter-depth"
            keyboardType="numbers-and-punctuation"
          />
        </View>
        <View style={styles.cell}>
          <TextField
            label="Widest that fits the wall"
            unit="in"
            value={filters.maxWidth}
            onChangeText={set('maxWidth')}
            errors={errors.maxWidth}
            testID="filter-width"
            keyboardType="numbers-and-punctuation"
          />
        </View>
        <View style={styles.cell}>
          <TextField
            label="Heaviest piece carried in"
            unit="lb"
            value={filters.maxPieceWeight}
            onChangeText={set('maxPieceWeight')}
            errors={errors.maxPieceWeight}
            testID="filter-weight"
            keyboardType="numbers-and-punctuation"
          />
        </View>
        <View style={styles.cell}>
          <TextField
            label="Longest piece carried in"
            unit="ft"
            value={filters.maxPieceLength}
            onChangeText={set('maxPieceLength')}
            errors={errors.maxPieceLength}
            testID="filter-length"
            keyboardType="numbers-and-punctuation"
          />
        </View>
      </View>
      <ChoiceGroup
        label="Sort"
        choices={sortChoices}
        value={filters.sortBy}
        onChange={set('sortBy')}
        testID="shortlist-sort"
      />
      <FieldMessages messages={errors._} />
      {run.ok ? (
        <>
          <Text variant="caption" tone="muted" testID="shortlist-counts">
            {run.result.counts.passing} of {run.result.counts.checked} sizes pass (
            {run.result.counts.filteredOut} left out by the filters). Length to buy{' '}
            {formatFtIn(run.result.spans.lengthToBuyFt * 12)} (clear span + bearing at both ends).
          </Text>
          {run.result.passing.length === 0 ? <Text>No size passes with these filters.</Text> : null}
          {run.result.passing.map((entry) => (
            <EntryRow
              key={`${entry.materialId}/${entry.sizeId}`}
              entry={entry}
              chosen={entry.materialId === chosen.materialId && entry.sizeId === chosen.sizeId}
              onChoose={() => onChoose(entry)}
            />
          ))}
          {run.result.nearMisses.length ? <Text variant="label">Near misses</Text> : null}
          {run.result.nearMisses.slice(0, 8).map((entry) => (
            <EntryRow
              key={`miss-${entry.materialId}/${entry.sizeId}`}
              entry={entry}
              chosen={false}
              onChoose={() => undefined}
            />
          ))}
          {run.result.warnings.map((w) => (
            <Text key={w} variant="caption">
              • {w}
            </Text>
          ))}
        </>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  family: { flexGrow: 1, flexBasis: 110 },
  cell: { flexGrow: 1, flexBasis: 150 },
  entry: {
    gap: spacing.xs,
    paddingVertical: spacing.sm,
    borderBottomWidth: 1,
    borderBottomColor: colors.line,
  },
  entryHead: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  grow: { flex: 1 },
});
