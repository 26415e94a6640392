import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import Svg, { G, Line, Path, Rect, Text as SvgText } from 'react-native-svg';
import type { ChainStep } from '@/lib/calc/load-path';
import { colors, spacing } from '@/lib/theme';
import { diagramLook } from '@/lib/ui/diagrams/diagram-style';
import { Text } from '@/lib/ui/text';
import { groundElementKinds, type LoadPathElementKind } from '@/shared/schemas/calc/load-path';
import { chainLines } from './chain-text';
import { kindWords, lbText, pathStateLook } from './words';

const BOX_H = 66;
const GAP_Y = 46;
const GAP_X = 8;
const PAD = 4;
/** Average glyph width of 12 px Inter, px (for cutting a label to its box). */
const CHAR_PX = 6.6;

const cut = (text: string, px: number) => {
  const max = Math.max(4, Math.floor(px / CHAR_PX));
  return text.length <= max ? text : `${text.slice(0, max - 1)}…`;
};

interface Box {
  step: ChainStep;
  x: number;
  y: number;
  w: number;
}

/** Boxes level by level (one row per depth), each row sharing the width. */
function layout(steps: readonly ChainStep[], width: number): { boxes: Map<string, Box>; height: number } {
  const rows = new Map<number, ChainStep[]>();
  for (const s of steps) rows.set(s.depth, [...(rows.get(s.depth) ?? []), s]);
  const boxes = new Map<string, Box>();
  let height = PAD;
  for (const depth of [...rows.keys()].sort((a, b) => a - b)) {
    const row = rows.get(depth) as ChainStep[];
    const w = (width - 2 * PAD - GAP_X * (row.length - 1)) / row.length;
    const y = PAD + depth * (BOX_H + GAP_Y);
    row.forEach((step, i) => boxes.set(step.element.id, { step, x: PAD + i * (w + GAP_X), y, w }));
    height = y + BOX_H + PAD + 10;
  }
  return { boxes, height };
}

/**
 * A section of the load path under a member, level by level: each element as a box with its state in words,
 * each end's load on the line down to what it bears on, and the ground hatched under footings and
 * foundation walls. The list under it says the same in text.
 */
export function LoadPathDrawing({ steps, testID }: { steps: readonly ChainStep[]; testID?: string }) {
  const [width, setWidth] = useState(0);
  const { boxes, height } = useMemo(() => layout(steps, width), [steps, width]);
  const lines = useMemo(() => chainLines(steps), [steps]);
  const summary = lines.map((l) => `${l.title}: ${l.state}`).join('. ');
  return (
    <View style={styles.wrap} testID={testID}>
      <View
        onLayout={(e) => setWidth(e.nativeEvent.layout.width)}
        role="img"
        aria-label={`Section of the load path. ${summary}`}
      >
        {width > 0 ? (
          <Svg width={width} height={height} aria-hidden>
            {[...boxes.values()].flatMap((box) =>
              box.step.element.ends.map((end) => {
                const below = end.ontoId ? boxes.get(end.ontoId) : undefined;
                const x1 =
                  box.x + box.w / 2 + (end.end === 'left' ? -box.w / 4 : end.end === 'right' ? box.w / 4 : 0);
                const y1 = box.y + BOX_H;
                const x2 = below ? below.x + below.w / 2 : x1;
                const y2 = below ? below.y : y1 + GAP_Y * 0.7;
                const midX = (x1 + x2) / 2;
                const midY = (y1 + y2) / 2;
                const label = lbText(end.governingLb);
                return (
                  <G key={`${box.step.element.id}-${end.end}`}>
                    <Line
                      x1={x1}
                      y1={y1}
                      x2={x2}
                      y2={y2}
                      stroke={below ? diagramLook.arrow : colors.danger}
                      strokeWidth={2}
                      strokeDasharray={below ? undefined : '4 3'}
                    />
                    <Path
                      d={`M${x2 - 5} ${y2 - 8} L${x2} ${y2} L${x2 + 5} ${y2 - 8}`}
                      stroke={below ? diagramLook.arrow : colors.danger}
                      strokeWidth={2}
                      fill="none"
                    />
                    <Rect
                      x={midX - label.length * 3.4 - 4}
                      y={midY - 10}
                      width={label.length * 6.8 + 8}
                      height={18}
                      rx={4}
                      fill={diagramLook.chipFill}
                      stroke={diagramLook.chipStroke}
                    />
                    <SvgText
                      x={midX}
                      y={midY + 3}
                      fontSize={12}
                      fontFamily={diagramLook.fontStrong}
                      fill={diagramLook.text}
                      textAnchor="middle"
                    >
                      {below ? label : `${label} → ?`}
                    </SvgText>
                  </G>
                );
              }),
            )}
            {[...boxes.values()].map((box) => {
              const e = box.step.element;
              const look = pathStateLook[e.state];
              const ground = (groundElementKinds as readonly string[]).includes(e.kind);
              const danger = look.tone === 'danger';
              return (
                <G key={e.id}>
                  <Rect
                    x={box.x}
                    y={box.y}
                    width={box.w}
                    height={BOX_H}
                    rx={6}
                    fill={danger ? colors.dangerSoft : diagramLook.beamFill}
                    stroke={danger ? colors.danger : diagramLook.zeroLine}
                    strokeWidth={danger ? 2 : 1}
                  />
                  <SvgText
                    x={box.x + 8}
                    y={box.y + 18}
                    fontSize={13}
                    fontFamily={diagramLook.fontStrong}
                    fill={diagramLook.text}
                  >
                    {cut(e.label, box.w - 16)}
                  </SvgText>
                  <SvgText
                    x={box.x + 8}
                    y={box.y + 36}
                    fontSize={12}
                    fontFamily={diagramLook.fontRegular}
                    fill={diagramLook.muted}
                  >
                    {cut(kindWords[e.kind as LoadPathElementKind], box.w - 16)}
                  </SvgText>
                  <SvgText
                    x={box.x + 8}
                    y={box.y + 55}
                    fontSize={12}
                    fontFamily={diagramLook.fontStrong}
                    fill={danger ? colors.danger : diagramLook.text}
                  >
                    {cut(`${look.icon === 'check' ? '✓' : '!'} ${look.word}`, box.w - 16)}
                  </SvgText>
                  {ground ? (
                    <Path
                      d={Array.from(
                        { length: Math.floor(box.w / 10) },
                        (_, i) => `M${box.x + i * 10} ${box.y + BOX_H + 10} l8 -8`,
                      ).join(' ')}
                      stroke={diagramLook.zeroLine}
                      strokeWidth={1}
                    />
                  ) : null}
                </G>
              );
            })}
          </Svg>
        ) : null}
      </View>
      <View style={styles.list} testID={testID ? `${testID}-text` : undefined}>
        {lines.map((line) => (
          <View key={line.id} style={styles.item}>
            <Text variant="bodyStrong">{line.title}</Text>
            <Text tone={line.state.startsWith('Passes') ? 'ink' : 'danger'}>{line.state}</Text>
            {line.lines.map((l) => (
              <Text key={l} variant="caption">
                {l}
              </Text>
            ))}
          </View>
        ))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.md },
  list: { gap: spacing.md },
  item: { gap: spacing.xxs },
});
