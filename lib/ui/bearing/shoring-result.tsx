import { StyleSheet, View } from 'react-native';
import { formatIn, formatNumber } from '@/lib/format';
import { spacing } from '@/lib/theme';
import { Card } from '@/lib/ui/card';
import { CautionNote } from '@/lib/ui/caution-note';
import { Notice } from '@/lib/ui/notice';
import { Text } from '@/lib/ui/text';
import type { ShoringPlanBody, ShoringResult as Result } from '@/shared/schemas/shoring-plans';
import { ShoringSketch } from './shoring-sketch';

/** A plan (saved, or live): the sketch, each wall's load, studs or shores, what it stands on, the sequence, cautions. */
export function ShoringResult({ result, input }: { result: Result; input: ShoringPlanBody }) {
  const setback = input.setbackFt ?? 2;
  return (
    <View style={styles.wrap} testID="shoring-result">
      <Notice
        tone={result.pass ? 'success' : 'error'}
        title={result.pass ? 'Plan holds' : 'Plan does not hold'}
      >
        {result.pass
          ? 'Each temporary wall carries its load and stands on something that can take it, as planned.'
          : 'A temporary wall as planned cannot carry its load or stand where it is: see below.'}
      </Notice>
      <Card title="Section">
        <ShoringSketch bothSides={input.layout === 'both-sides'} setbackFt={setback} />
      </Card>
      {result.plan.walls.map((wall) => {
        const takeoff = result.takeoff?.find((t) => t.side === wall.side);
        const shores = result.shores?.find((s) => s.side === wall.side);
        return (
          <Card key={wall.side} title={`Temporary wall ${wall.side}`} testID={`shoring-wall-${wall.side}`}>
            <Text variant="bodyStrong">Load during the swap: {formatNumber(wall.loadPlf, 0)} plf</Text>
            {shores ? (
              <Text>{shores.summary}</Text>
            ) : (
              <Text>
                Studs: {formatNumber(wall.check.loadPerStudLb, 0)} lb each of{' '}
                {formatNumber(wall.check.capacityPerStudLb, 0)} lb ({wall.check.pass ? 'passes' : 'too much'}{' '}
                at {input.studs.studSpacingIn} in)
                {wall.check.layoutSpacingIn
                  ? `; widest spacing that works: ${wall.check.layoutSpacingIn} in`
                  : ''}
                .
              </Text>
            )}
            {takeoff ? (
              <Text testID={`shoring-takeoff-${wall.side}`}>
                {takeoff.studCount} studs at {takeoff.spacingIn} in, cut {formatIn(takeoff.studLengthIn)} (buy{' '}
                {takeoff.studStock.count} × {takeoff.studStock.label}); {takeoff.plates} plates{' '}
                {formatIn(takeoff.plateLengthIn)} (buy {takeoff.plateStock.count} × {takeoff.plateStock.label}
                ).
              </Text>
            ) : null}
            <Notice
              tone={wall.standing.verdict === 'not-acceptable' ? 'error' : 'warning'}
              title="What it stands on"
              testID={`standing-${wall.side}`}
            >
              <Text>{wall.standing.summary}</Text>
              {wall.standing.actions.map((a) => (
                <Text key={a}>• {a}</Text>
              ))}
            </Notice>
          </Card>
        );
      })}
      <Card title="Sequence (common practice)" testID="shoring-sequence">
        {result.sequence.map((step, i) => (
          <Text key={step}>
            {i + 1}. {step}
          </Text>
        ))}
      </Card>
      {result.plan.warnings.length > 0 ? (
        <Card title="Warnings">
          {result.plan.warnings.map((w) => (
            <Text key={w}>• {w}</Text>
          ))}
        </Card>
      ) : null}
      <Card title="Assumptions">
        {[...result.plan.notes, ...result.plan.cautions].map((w) => (
          <Text key={w} variant="caption">
            • {w}
          </Text>
        ))}
      </Card>
      <CautionNote shoring />
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { gap: spacing.lg } });
