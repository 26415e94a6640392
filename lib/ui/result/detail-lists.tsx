import { StyleSheet, View } from 'react-native';
import { formatFtIn, formatLb, formatNumber, formatPlf } from '@/lib/format';
import { colors, spacing } from '@/lib/theme';
import { Card } from '@/lib/ui/card';
import { Text } from '@/lib/ui/text';
import { valueMemo } from '@/lib/ui/value-memo';
import type { MemberCheckResult } from '@/shared/schemas/calc/member';

const typeWords: Record<string, string> = { D: 'dead', L: 'live', Lr: 'roof live', S: 'snow' };

type Result = MemberCheckResult;

// Each line and block below is drawn again only when its own values change: a new span moves the
// reactions and demands, not most loads, factors or warnings.
const TakedownLine = valueMemo(function TakedownLine({ line }: { line: Result['takedown'][number] }) {
  return (
    <View style={styles.row}>
      <Text variant="bodyStrong" style={styles.grow}>
        {line.label} · {typeWords[line.type] ?? line.type}
      </Text>
      <Text variant="label">
        {line.wPlf !== undefined ? formatPlf(line.wPlf) : line.pLb !== undefined ? formatLb(line.pLb) : ''}
      </Text>
      <Text variant="caption" tone="muted" style={styles.full}>
        {line.expression}
        {line.flag ? ` · ${line.flag}` : ''}
      </Text>
    </View>
  );
});

const SnowLine = valueMemo(function SnowLine({ snow }: { snow: NonNullable<Result['snow']> }) {
  return (
    <Text variant="caption" tone="muted">
      Roof snow {formatNumber(snow.designPsf, 1)} psf (
      {snow.governing === 'minimum' ? 'low-slope minimum' : 'sloped roof'}
      ): {snow.factors.map((f) => `${f.symbol} ${formatNumber(f.value, 2)}`).join(', ')}. {snow.reference}
    </Text>
  );
});

type Check = Result['checks'][number];

const FactorBlock = valueMemo(function FactorBlock({
  label,
  formula,
  note,
  factors,
}: Pick<Check, 'label' | 'formula' | 'note' | 'factors'>) {
  return (
    <View style={styles.block}>
      <Text variant="label">{label}</Text>
      <Text variant="caption" tone="muted">
        {formula}
        {note ? ` · ${note}` : ''}
      </Text>
      <Text variant="caption">
        {factors
          .map((f) => `${f.symbol} = ${formatNumber(f.value, 3)}${f.note ? ` (${f.note})` : ''}`)
          .join('; ')}
      </Text>
    </View>
  );
});

/** The load takedown line by line: what each source puts on the member, by load type, with its flag. */
export function TakedownList({ result }: { result: MemberCheckResult }) {
  return (
    <Card title="Loads on the member" testID="takedown">
      {result.snow ? <SnowLine snow={result.snow} /> : null}
      {result.takedown.map((line, i) => (
        <TakedownLine key={`${line.label}-${line.type}-${i}`} line={line} />
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
        <FactorBlock
          key={check.id}
          label={check.label}
          formula={check.formula}
          note={check.note}
          factors={check.factors}
        />
      ))}
    </Card>
  );
}

const SupportCard = valueMemo(function SupportCard({
  bearing,
  requirements,
}: {
  bearing: Result['bearing'];
  requirements: Result['mount']['requirements'];
}) {
  return (
    <Card title="Bearing and mounting" testID="bearing">
      <Text>
        Needs {formatNumber(bearing.requiredLengthIn, 2)} in of bearing at the heavier end (
        {bearing.governedBy === 'plate' ? 'the plate under the jacks governs' : 'the member governs'});
        provided {formatNumber(bearing.providedLengthIn, 2)} in.
      </Text>
      <Text variant="bodyStrong" testID="jack-studs">
        {bearing.jackStuds} jack stud{bearing.jackStuds === 1 ? '' : 's'} each end
      </Text>
      <Text variant="caption" tone="muted">
        {bearing.jackStudsNote}
      </Text>
      {requirements.map((req) => (
        <Text key={req}>• {req}</Text>
      ))}
    </Card>
  );
});

/** Bearing, jack studs and what the mount asks for. */
export function SupportList({ result }: { result: MemberCheckResult }) {
  return <SupportCard bearing={result.bearing} requirements={result.mount.requirements} />;
}

const WarningsCard = valueMemo(function WarningsCard({
  warnings,
  sources,
}: Pick<Result, 'warnings' | 'sources'>) {
  return (
    <Card title={warnings.length ? `Warnings (${warnings.length})` : 'Warnings'} testID="warnings">
      {warnings.length === 0 ? <Text tone="muted">None.</Text> : null}
      {warnings.map((w) => (
        <Text key={w}>• {w}</Text>
      ))}
      <Text variant="label">Sources</Text>
      {sources.map((s) => (
        <Text key={s} variant="caption" tone="muted">
          {s}
        </Text>
      ))}
    </Card>
  );
});

/** Warnings and the sources the check rests on. */
export function WarningsList({ result }: { result: MemberCheckResult }) {
  return <WarningsCard warnings={result.warnings} sources={result.sources} />;
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
