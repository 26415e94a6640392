import { useMemo } from 'react';
import { View } from 'react-native';
import Svg, { G, Line, Path, Rect } from 'react-native-svg';
import type { MemberCheckResult } from '@/shared/schemas/calc/member';
import { valueMemo } from '../value-memo';
import { DiagramLabel } from './diagram-label';
import { diagramLook } from './diagram-style';
import { loadDiagramText } from './diagram-text';
import { layoutLoads, type LoadArrow, type LoadBand } from './load-layout';
import type { DimensionLine } from './support-layout';

export type LoadDiagramProps = {
  /** A member check result (takedown, spans, reactions). */
  result: MemberCheckResult;
  /** Drawing width, px (the container's, from onLayout). */
  width: number;
  testID?: string;
};

const HEAD = 4;

/**
 * A uniform load's band with its down-ticks, all ticks in one path (a span change moves them, not remounts).
 * Band, Arrow and Dimension are drawn again only when their own numbers change.
 */
const Band = valueMemo(function Band({ band }: { band: LoadBand }) {
  const bottom = band.y + band.height;
  return (
    <G>
      <Rect x={band.x} y={band.y} width={band.width} height={band.height} fill={diagramLook.loadFill} />
      <Line
        x1={band.x}
        x2={band.x + band.width}
        y1={band.y}
        y2={band.y}
        stroke={diagramLook.loadStroke}
        strokeWidth={2}
      />
      {band.ticks.length ? (
        <Path
          d={band.ticks
            .map(
              (x) =>
                `M${x} ${band.y}V${bottom}M${x - 2.5} ${bottom - 3}L${x} ${bottom}L${x + 2.5} ${bottom - 3}`,
            )
            .join('')}
          stroke={diagramLook.loadStroke}
          strokeWidth={1.25}
          fill={diagramLook.none}
        />
      ) : null}
    </G>
  );
});

const Arrow = valueMemo(function Arrow({ arrow }: { arrow: LoadArrow }) {
  const { x, yTop, yBottom } = arrow;
  return (
    <G>
      <Line x1={x} x2={x} y1={yTop} y2={yBottom - HEAD} stroke={diagramLook.arrow} strokeWidth={2} />
      <Path
        d={`M${x - HEAD} ${yBottom - HEAD * 1.6}L${x} ${yBottom}L${x + HEAD} ${yBottom - HEAD * 1.6}Z`}
        fill={diagramLook.arrow}
      />
    </G>
  );
});

const Dimension = valueMemo(function Dimension({ dim }: { dim: DimensionLine }) {
  const tick = 5;
  return (
    <G>
      <Line x1={dim.x1} x2={dim.x2} y1={dim.y} y2={dim.y} stroke={diagramLook.muted} />
      <Line x1={dim.x1} x2={dim.x1} y1={dim.y - tick} y2={dim.y + tick} stroke={diagramLook.muted} />
      <Line x1={dim.x2} x2={dim.x2} y1={dim.y - tick} y2={dim.y + tick} stroke={diagramLook.muted} />
      <DiagramLabel label={dim.label} />
    </G>
  );
});

/**
 * The loaded member: uniform loads as bands and point loads as arrows to scale along the span, each
 * labelled, on the beam with both bearings to scale, the largest reactions and the clear and design spans.
 */
export function LoadDiagram({ result, width, testID }: LoadDiagramProps) {
  const layout = useMemo(() => layoutLoads(result, width), [result, width]);
  const text = useMemo(() => loadDiagramText(result), [result]);
  const { beam } = layout;
  return (
    <View role="img" aria-label={text} accessibilityLabel={text} testID={testID}>
      <Svg width={layout.width} height={layout.height} aria-hidden>
        {layout.bands.map((band) => (
          <Band key={`band-${band.loadIndex}`} band={band} />
        ))}
        <Rect
          x={beam.x}
          y={beam.y}
          width={beam.width}
          height={beam.height}
          fill={diagramLook.beamFill}
          stroke={diagramLook.ink}
          strokeWidth={1.5}
        />
        {layout.bearings.map((b, i) => (
          <G key={i === 0 ? 'left' : 'right'}>
            <Rect x={b.x} y={b.y} width={b.width} height={b.height} fill={diagramLook.bearingFill} />
            <Line
              x1={b.x - 6}
              x2={b.x + b.width + 6}
              y1={b.y + b.height}
              y2={b.y + b.height}
              stroke={diagramLook.ink}
              strokeWidth={1.5}
            />
          </G>
        ))}
        {layout.arrows.map((arrow) => (
          <Arrow key={`arrow-${arrow.loadIndex}`} arrow={arrow} />
        ))}
        {layout.dimensions.map((dim) => (
          <Dimension key={dim.label.id} dim={dim} />
        ))}
        {layout.labels.map((label) => (
          <DiagramLabel key={label.id} label={label} />
        ))}
      </Svg>
    </View>
  );
}
