import { useMemo } from 'react';
import { View } from 'react-native';
import Svg, { Line, Path } from 'react-native-svg';
import type { MemberCheckResult } from '@/shared/schemas/calc/member';
import { layoutCurve } from './curve-layout';
import { curveText } from './diagram-text';
import { DiagramLabel } from './diagram-label';
import { curveLook, diagramLook } from './diagram-style';
import type { CurveKind } from './value-text';

export type CurveDiagramProps = {
  /** A member check run with `{ diagrams: true }`. */
  result: MemberCheckResult;
  /** Drawing width, px (the container's, from onLayout). */
  width: number;
  testID?: string;
};

/** One of the sampled curves (shear, moment, deflection), drawn to the shared span scale. */
export function CurveDiagram({ result, width, kind, testID }: CurveDiagramProps & { kind: CurveKind }) {
  const layout = useMemo(() => layoutCurve(result, kind, width), [result, kind, width]);
  const text = useMemo(() => curveText(result, kind), [result, kind]);
  if (!layout) return null;
  const look = curveLook[kind];
  const [left, right] = layout.endXs;
  return (
    <View role="img" aria-label={text} accessibilityLabel={text} testID={testID}>
      <Svg width={layout.width} height={layout.height} aria-hidden>
        {layout.supportXs.map((x, i) => (
          // Keyed by support, not by position: a new span moves the guide instead of remounting it.
          <Line
            key={`support-${i}`}
            x1={x}
            x2={x}
            y1={0}
            y2={layout.height}
            stroke={diagramLook.guide}
            strokeDasharray="3 3"
          />
        ))}
        <Path d={layout.areaPath} fill={look.fill} />
        <Line
          x1={left}
          x2={right}
          y1={layout.baselineY}
          y2={layout.baselineY}
          stroke={diagramLook.zeroLine}
        />
        <Path
          d={layout.linePath}
          fill={diagramLook.none}
          stroke={look.stroke}
          strokeWidth={2}
          strokeLinejoin="round"
        />
        {layout.labels.map((label) => (
          <DiagramLabel key={label.id} label={label} />
        ))}
      </Svg>
    </View>
  );
}
