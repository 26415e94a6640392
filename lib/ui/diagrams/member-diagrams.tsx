import { memo, useState, type ReactNode } from 'react';
import { StyleSheet, View, type LayoutChangeEvent } from 'react-native';
import { spacing } from '@/lib/theme';
import type { MemberCheckResult } from '@/shared/schemas/calc/member';
import { Text } from '../text';
import { DeflectionDiagram } from './deflection-diagram';
import { DIAGRAM_TITLES } from './diagram-text';
import { LoadDiagram } from './load-diagram';
import { MomentDiagram } from './moment-diagram';
import { ShearDiagram } from './shear-diagram';

export type MemberDiagramsProps = {
  /** A member check run with `{ diagrams: true }`; without samples only the load diagram is drawn. */
  result: MemberCheckResult;
  testID?: string;
};

function Section({ title, note, children }: { title: string; note: string; children: ReactNode }) {
  return (
    <View style={styles.section}>
      <Text variant="heading">{title}</Text>
      <Text variant="caption" tone="muted">
        {note}
      </Text>
      {children}
    </View>
  );
}

/**
 * The four diagrams of a member check, one under the other on one span scale: the loaded member, shear,
 * bending moment and deflection. Measures its own width.
 */
function MemberDiagramsView({ result, testID }: MemberDiagramsProps) {
  const [width, setWidth] = useState(0);
  const onLayout = (e: LayoutChangeEvent) => {
    const next = Math.floor(e.nativeEvent.layout.width);
    if (next !== width) setWidth(next);
  };
  const combination = result.diagram?.combination;
  const under = combination ? `Under ${combination}, the governing combination.` : '';
  return (
    <View style={styles.stack} onLayout={onLayout} testID={testID}>
      {width > 0 ? (
        <>
          <Section
            title={DIAGRAM_TITLES.loads}
            note="Service loads by source; R is the largest reaction at each end."
          >
            <LoadDiagram result={result} width={width} testID={testID && `${testID}-loads`} />
          </Section>
          {combination ? (
            <>
              <Section title={DIAGRAM_TITLES.shear} note={`${under} Values in lb.`}>
                <ShearDiagram result={result} width={width} testID={testID && `${testID}-shear`} />
              </Section>
              <Section title={DIAGRAM_TITLES.moment} note={`${under} Values in lb·ft, sagging drawn up.`}>
                <MomentDiagram result={result} width={width} testID={testID && `${testID}-moment`} />
              </Section>
              <Section
                title={DIAGRAM_TITLES.deflection}
                note={`${under} Short-term, in inches; the check table adds creep to the total.`}
              >
                <DeflectionDiagram result={result} width={width} testID={testID && `${testID}-deflection`} />
              </Section>
            </>
          ) : null}
        </>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  stack: { alignSelf: 'stretch', gap: spacing.xl },
  section: { gap: spacing.xs },
});

/** The four diagrams; drawn again only for a new result. */
export const MemberDiagrams = memo(MemberDiagramsView);
