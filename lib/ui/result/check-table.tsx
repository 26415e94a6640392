import { StyleSheet, View } from 'react-native';
import { formatLb, formatPsf } from '@/lib/format';
import { colors, spacing } from '@/lib/theme';
import { Card } from '@/lib/ui/card';
import { Icon } from '@/lib/ui/icon';
import { Text } from '@/lib/ui/text';
import { valueMemo } from '@/lib/ui/value-memo';
import type { MemberCheckResult } from '@/shared/schemas/calc/member';
import { checkValueText, checkVerdictText } from './check-value';
import { RatioBar } from './ratio-bar';

type Check = MemberCheckResult['checks'][number];
type Post = NonNullable<MemberCheckResult['posts']>[number];

const CheckLine = valueMemo(function CheckLine({ check }: { check: Check }) {
  return (
    <View
      style={styles.row}
      testID={`check-${check.id}`}
      accessible
      aria-label={`${check.label}: demand ${checkValueText(check.demand, check.unit)}, capacity ${checkValueText(check.capacity, check.unit)}, ${checkVerdictText(check)}`}
    >
      <View style={styles.head}>
        <Icon name={check.pass ? 'check' : 'error'} color={check.pass ? colors.success : colors.danger} />
        <Text variant="bodyStrong" style={styles.label}>
          {check.label}
        </Text>
        <Text variant="label" tone={check.pass ? 'ink' : 'danger'}>
          {checkVerdictText(check)}
        </Text>
      </View>
      <RatioBar ratio={check.ratio} />
      <Text variant="caption" tone="muted">
        Demand {checkValueText(check.demand, check.unit)} · capacity{' '}
        {checkValueText(check.capacity, check.unit)} · {check.combination}
      </Text>
    </View>
  );
});

const PostLine = valueMemo(function PostLine({ post }: { post: Post }) {
  return (
    <View style={styles.row} testID={`check-post-${post.end}`}>
      <View style={styles.head}>
        <Icon name={post.pass ? 'check' : 'error'} color={post.pass ? colors.success : colors.danger} />
        <Text variant="bodyStrong" style={styles.label}>
          {post.end === 'centre' ? 'Centre post' : `Post, ${post.end} end`}
        </Text>
        <Text variant="label" tone={post.pass ? 'ink' : 'danger'}>
          {checkVerdictText(post)}
        </Text>
      </View>
      <RatioBar ratio={post.ratio} />
      <Text variant="caption" tone="muted">
        {formatLb(post.loadLb)} · footing pad {checkValueText(post.footingSideIn, 'in')} square at{' '}
        {formatPsf(post.soilBearingPsf)} soil · {post.combination}
      </Text>
    </View>
  );
});

/**
 * Every check: demand, capacity, the ratio as a number and a bar, passes or fails in words, the combination.
 * Each row is drawn again only when its own values change.
 */
export function CheckTable({ result }: { result: MemberCheckResult }) {
  return (
    <Card title="Checks" testID="check-table">
      {result.checks.map((check) => (
        <CheckLine key={check.id} check={check} />
      ))}
      {result.posts?.map((post) => (
        <PostLine key={post.end} post={post} />
      ))}
    </Card>
  );
}

const styles = StyleSheet.create({
  row: { gap: spacing.xs, paddingVertical: spacing.xs, borderBottomWidth: 1, borderBottomColor: colors.line },
  head: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm, flexWrap: 'wrap' },
  label: { flex: 1, minWidth: 140 },
});
