import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import Svg, { G, Path, Polyline, Rect, Text as SvgText } from 'react-native-svg';
import type { ChainStep } from '@/lib/calc/load-path';
import { colors, spacing } from '@/lib/theme';
import { diagramLook } from '@/lib/ui/diagrams/diagram-style';
import { Text } from '@/lib/ui/text';
import { chainLines } from './chain-text';
import { drawingLayout, fromChain, type DrawingText } from './drawing-layout';

const toneFill = { ink: diagramLook.text, muted: diagramLook.muted, danger: colors.danger } as const;

function DrawnText({ t }: { t: DrawingText }) {
  return (
    <SvgText
      x={t.x}
      y={t.y}
      fontSize={t.size}
      fontFamily={t.strong ? diagramLook.fontStrong : diagramLook.fontRegular}
      fill={toneFill[t.tone]}
      textAnchor={t.anchor}
    >
      {t.text}
    </SvgText>
  );
}

/**
 * A section of the load path under a member, level by level: each element as a box with its state in words,
 * each end's load on the line down to what it bears on, and the ground hatched under footings and
 * foundation walls. The list under it says the same in text.
 */
export function LoadPathDrawing({ steps, testID }: { steps: readonly ChainStep[]; testID?: string }) {
  const [width, setWidth] = useState(0);
  const layout = useMemo(() => drawingLayout(fromChain(steps), width), [steps, width]);
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
          <Svg width={width} height={layout.height} aria-hidden>
            {layout.links.map((link) => {
              const stroke = link.toId ? diagramLook.arrow : colors.danger;
              const b = link.points[link.points.length - 1];
              return (
                <G key={`${link.fromId}-${link.points[0].x}`}>
                  <Polyline
                    points={link.points.map((p) => `${p.x},${p.y}`).join(' ')}
                    stroke={stroke}
                    strokeWidth={2}
                    fill="none"
                    strokeDasharray={link.toId ? undefined : '4 3'}
                  />
                  <Path
                    d={`M${b.x - 5} ${b.y - 8} L${b.x} ${b.y} L${b.x + 5} ${b.y - 8}`}
                    stroke={stroke}
                    strokeWidth={2}
                    fill="none"
                  />
                  <Rect
                    x={link.chip.x}
                    y={link.chip.y}
                    width={link.chip.w}
                    height={link.chip.h}
                    rx={4}
                    fill={diagramLook.chipFill}
                    stroke={diagramLook.chipStroke}
                  />
                  <DrawnText t={link.label} />
                </G>
              );
            })}
            {layout.boxes.map((box) => (
              <G key={box.id}>
                <Rect
                  x={box.x}
                  y={box.y}
                  width={box.w}
                  height={box.h}
                  rx={6}
                  fill={box.danger ? colors.dangerSoft : diagramLook.beamFill}
                  stroke={box.danger ? colors.danger : diagramLook.zeroLine}
                  strokeWidth={box.danger ? 2 : 1}
                />
                {box.ground ? (
                  <Path
                    d={Array.from(
                      { length: Math.floor(box.w / 10) },
                      (_, i) => `M${box.x + i * 10} ${box.y + box.h + 10} l8 -8`,
                    ).join(' ')}
                    stroke={diagramLook.zeroLine}
                    strokeWidth={1}
                  />
                ) : null}
              </G>
            ))}
            {layout.texts.map((t, i) => (
              <DrawnText key={`${i}-${t.text}`} t={t} />
            ))}
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
