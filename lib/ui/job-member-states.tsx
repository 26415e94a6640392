import { StyleSheet, View } from 'react-native';
import type { MemberStateCounts } from '@/shared/schemas/jobs';
import { memberStates } from '@/shared/schemas/members';
import { iconSize, spacing } from '@/lib/theme';
import { Icon } from './icon';
import { memberStateLook } from './member-state';
import { Text } from './text';

const SHORT_WORDS: Record<keyof MemberStateCounts, string> = {
  passes: 'pass',
  fails: 'fail',
  'engineer-needed': 'need an engineer',
  'load-path-open': 'load path open',
};

const ONE_WORDS: Record<keyof MemberStateCounts, string> = {
  ...SHORT_WORDS,
  passes: 'passes',
  fails: 'fails',
  'engineer-needed': 'needs an engineer',
};

/** A job's members by state, in words with the job page's icons: "2 pass · 1 fail · 1 load path open". */
export function JobMemberStates({ counts }: { counts: MemberStateCounts }) {
  const shown = memberStates.filter((state) => counts[state] > 0);
  if (shown.length === 0)
    return (
      <Text variant="caption" tone="muted" testID="job-member-states">
        No members yet
      </Text>
    );
  return (
    <View style={styles.wrap} testID="job-member-states">
      {shown.map((state) => (
        <View key={state} style={styles.item}>
          <Icon name={memberStateLook[state].icon} size={iconSize.sm} />
          <Text variant="caption" tone={memberStateLook[state].tone}>
            {counts[state]} {(counts[state] === 1 ? ONE_WORDS : SHORT_WORDS)[state]}
          </Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { flexDirection: 'row', flexWrap: 'wrap', columnGap: spacing.md, rowGap: spacing.xxs },
  item: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs },
});
