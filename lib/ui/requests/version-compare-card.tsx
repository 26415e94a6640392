import { useMemo, useState } from 'react';
import { StyleSheet, useWindowDimensions, View } from 'react-native';
import { useRequestVersion } from '@/lib/hooks/use-design-requests';
import { diffVersions } from '@/lib/requests/version-diff';
import { spacing } from '@/lib/theme';
import type { RequestDetail } from '@/shared/schemas/requests/views';
import { Card } from '../card';
import { ChoiceGroup } from '../choice-group';
import { Text } from '../text';
import { ChangeGroup } from './change-group';

/** A group opens at first when it or the whole comparison is this short; longer ones fold, with their counts. */
const OPEN_GROUP_UP_TO = 12;
const OPEN_ALL_UP_TO = 24;

function Comparison({ requestId, from, to }: { requestId: string; from: number; to: number }) {
  const { width } = useWindowDimensions();
  const older = useRequestVersion(requestId, from);
  const newer = useRequestVersion(requestId, to);
  const diff = useMemo(
    () => (older.data && newer.data ? diffVersions(older.data.snapshot, newer.data.snapshot) : null),
    [older.data, newer.data],
  );
  if (older.error || newer.error)
    return (
      <Text tone="danger">
        These versions could not be loaded. Check the connection and open the request again.
      </Text>
    );
  if (!diff)
    return (
      <Text tone="muted">
        Loading versions {from} and {to}…
      </Text>
    );
  if (diff.count === 0)
    return (
      <Text testID="change-none">
        No changes: version {to} is the same as version {from}.
      </Text>
    );
  return (
    <View style={styles.groups}>
      <Text variant="bodyStrong" testID="change-count">
        {diff.count} {diff.count === 1 ? 'change' : 'changes'} from version {from} to version {to}, in{' '}
        {diff.groups.length} {diff.groups.length === 1 ? 'part' : 'parts'}
      </Text>
      {diff.groups.map((group) => (
        <ChangeGroup
          key={`${from}-${to}-${group.key}`}
          group={group}
          from={from}
          to={to}
          stacked={width < 720}
          openAtFirst={group.count <= OPEN_GROUP_UP_TO || diff.count <= OPEN_ALL_UP_TO}
        />
      ))}
    </View>
  );
}

/**
 * Two sent versions side by side, field by field, grouped by member and section; the reader picks the two
 * (the latest and the one before at first). Each version's own note says why it was made.
 */
export function VersionCompareCard({ request }: { request: RequestDetail }) {
  const numbers = request.versions.map((v) => v.version);
  const [from, setFrom] = useState(numbers.at(-2) ?? 1);
  const [to, setTo] = useState(numbers.at(-1) ?? 1);
  const choices = numbers.map((n) => ({ value: String(n), label: `Version ${n}` }));
  const [older, newer] = from <= to ? [from, to] : [to, from];
  return (
    <Card title="What changed between versions" testID="request-changes">
      {request.versions
        .filter((v) => v.version > 1)
        .map((v) => (
          <Text key={v.version} variant="caption">
            Version {v.version}
            {v.note ? `: ${v.note}` : ': no note'}
          </Text>
        ))}
      <View style={styles.pickers}>
        <ChoiceGroup
          label="Compare"
          choices={choices}
          value={String(from)}
          onChange={(v) => setFrom(Number(v))}
          testID="compare-from"
        />
        <ChoiceGroup
          label="with"
          choices={choices}
          value={String(to)}
          onChange={(v) => setTo(Number(v))}
          testID="compare-to"
        />
      </View>
      {older === newer ? (
        <Text tone="muted">Pick two different versions to compare.</Text>
      ) : (
        <Comparison requestId={request.id} from={older} to={newer} />
      )}
    </Card>
  );
}

const styles = StyleSheet.create({
  pickers: { gap: spacing.sm },
  groups: { gap: spacing.md },
});
