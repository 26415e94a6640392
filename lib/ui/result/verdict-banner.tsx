import { memo } from 'react';
import { StyleSheet, View } from 'react-native';
import { formatNumber } from '@/lib/format';
import { colors, radii, spacing } from '@/lib/theme';
import { Icon } from '@/lib/ui/icon';
import { Text } from '@/lib/ui/text';
import type { MemberCheckResult } from '@/shared/schemas/calc/member';

/** The overall verdict in words with the governing check and its ratio. */
export function verdictText(result: MemberCheckResult): { title: string; detail: string; short: string } {
  const governing = result.checks.find((c) => c.id === result.governing.check);
  const label = governing?.label ?? result.governing.check;
  const ratio = formatNumber(result.governing.ratio, 2);
  return {
    title: result.pass ? 'Passes the preliminary check' : 'Fails the preliminary check',
    detail: `${label} governs at ${ratio} (${result.governing.combination})`,
    short: `${label.split(' (')[0]} ${ratio}`,
  };
}

function VerdictBannerView({ result, compact = false }: { result: MemberCheckResult; compact?: boolean }) {
  const { title, detail, short } = verdictText(result);
  return (
    <View
      role="status"
      testID={compact ? 'verdict-bar' : 'verdict'}
      style={[styles.box, compact && styles.compact, result.pass ? styles.passBox : styles.failBox]}
    >
      <Icon name={result.pass ? 'check' : 'error'} color={result.pass ? colors.success : colors.danger} />
      <View style={styles.text}>
        <Text
          variant="bodyStrong"
          style={result.pass ? styles.passText : styles.failText}
          numberOfLines={compact ? 1 : undefined}
        >
          {compact ? (result.pass ? 'Passes' : 'Fails') : title}
        </Text>
        <Text variant="caption" numberOfLines={compact ? 1 : undefined}>
          {compact ? short : `${result.member.sizeLabel} ${result.member.materialLabel} · ${detail}`}
        </Text>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.md,
    padding: spacing.lg,
    borderRadius: radii.md,
    borderWidth: 2,
    alignSelf: 'stretch',
  },
  compact: { padding: spacing.sm, paddingHorizontal: spacing.md },
  passBox: { borderColor: colors.success, backgroundColor: colors.successSoft },
  failBox: { borderColor: colors.danger, backgroundColor: colors.dangerSoft },
  passText: { color: colors.success },
  failText: { color: colors.danger },
  text: { flex: 1, gap: spacing.xxs },
});

/** The verdict as a banner: icon, words, the member and the governing check. Drawn again only for a new result. */
export const VerdictBanner = memo(VerdictBannerView);
