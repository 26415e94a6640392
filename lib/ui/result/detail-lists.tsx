import { StyleSheet, View } from 'react-native';
import { formatFtIn, formatLb, formatNumber, formatPlf } from '@/lib/format';
import { colors, spacing } from '@/lib/theme';
import { Card } from '@/lib/ui/card';
import { Text } from '@/lib/ui/text';
import type { MemberCheckResult } from '@/shared/schemas/calc/member';

const typeWords: Record<string, string> = { D: 'dead', L: 'live', Lr: 'roof live', S: 'snow' };

/** The load takedown line by line: what each source puts on the member, by load type, with its flag. */
export function TakedownList({ result }: { result: MemberCheckResult }) {
  return (
    <Card title="Loads on the member" testID="takedown">
      {result.snow ? (
        <Text variant="caption" tone="muted">
          Roof snow {formatNumber(result.snow.designPsf, 1)} psf (
          {result.snow.governing === 'minimum' ? 'low-slope minimum' : 'sloped roof'}
          ): {result.snow.factors.map((f) => `${f.symbol} ${formatNumber(f.value, 2)}`).join(', ')}.{' '}
          {result.snow.reference}
        </Text>
      ) : null}
      {result.takedown.map((line, i) => (
        <View key={`${line.label}-${line.type}-${i}`} style={styles.row}>
          <Text variant="bodyStrong" style={styles.grow}>
            {line.label} · {typeWords[line.type] ?? line.type}
          </Text>
          <Text variant="label">
            {line.wPlf !== undefined
              ? formatPlf(line.wPlf)
              : line.pLb !== undefined
                ? formatLb(line.pLb)
                : ''}
          </Text>
          <Text variant="caption" tone="muted" style={styles.full}>
            {line.expression}
            {line.flag ? ` · ${line.flag}` : ''}
          </Text>
        </View>
      ))}
      <Text variant="caption" tone="muted">
        Reactions ({result.reactions.combination}): left {formatLb(result.reactions.leftLb)}, right{' '}
        {formatLb(result.reactions.rightLb)}. Spans: clear {formatFtIn(result.spans.clearSpanFt * 12)}, design{' '}
        {formatFtIn(result.spans.designSpanFt * 12)} (support centres), length to buy{' '}
        {formatFtIn(result.spans.lengthToBuyFt * 12)}.
      </Text>
    </Card>
  );
}

/** Every factor each check used, with its value and what it is. */
export function FactorsList({ result }: { result: MemberCheckResult }) {
  return (
    <Card title="Factors used" testID="factors">
      {result.checks.map((check) => (
        <View key={check.id} style={styles.block}>
          <Text variant="label">{check.label}</Text>
          <Text variant="caption" tone="muted">
            {check.formula}
            {check.note ? ` · ${check.note}` : ''}
          </Text>
          <Text variant="caption">
            {check.factors
              .map((f) => `${f.symbol} = ${formatNumber(f.value, 3)}${f.note ? ` (${f.note})` : ''}`)
              .join('; ')}
          </Text>
        </View>
      ))}
    </Card>
  );
}

/** Bearing, jack studs and what the mount asks for. */
export function SupportList({ result }: { result: MemberCheckResult }) {
  return (
    <Card title="Bearing and mounting" testID="bearing">
      <Text>
        Needs {formatNumber(result.bearing.requiredLengthIn, 2)} in of bearing at the heavier end (
        {result.bearing.governedBy === 'plate' ? 'the plate under the jacks governs' : 'the member governs'});
        provided {formatNumber(result.bearing.providedLengthIn, 2)} in.
      </Text>
      <Text variant="bodyStrong" testID="jack-studs">
        {result.bearing.jackStuds} jack stud{result.bearing.jackStuds === 1 ? '' : 's'} each end
      </Text>
      <Text variant="caption" tone="muted">
        {result.bearing.jackStudsNote}
      </Text>
      {result.mount.requirements.map((req) => (
        <Text key={req}>• {req}</Text>
      ))}
    </Card>
  );
}

/** Warnings and the sources the check rests on. */
export function WarningsList({ result }: { result: MemberCheckResult }) {
  return (
    <Card
      title={result.warnings.length ? `Warnings (${result.warnings.length})` : 'Warnings'}
      testID="warnings"
    >
      {result.warnings.length === 0 ? <Text tone="muted">None.</Text> : null}
      {result.warnings.map((w) => (
        <Text key={w}>• {w}</Text>
      ))}
      <Text variant="label">Sources</Text>
      {result.sources.map((s) => (
        <Text key={s} variant="caption" tone="muted">
          {s}
        </Text>
      ))}
    </Card>
  );
}

const styles = StyleSheet.create({
  row: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    gap: spacing.xs,
    paddingVertical: spacing.xs,
    borderBottomWidth: 1,
    borderBottomColor: colors.line,
  },
  grow: { flex: 1 },
  full: { width: '100%' },
  block: { gap: spacing.xxs },
});
