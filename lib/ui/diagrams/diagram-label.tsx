import { memo } from 'react';
import { G, Rect, Text as SvgText } from 'react-native-svg';
import type { PlacedLabel } from './label-placement';
import { diagramLook } from './diagram-style';
import { LABEL_FONT_SIZE, LABEL_PAD_X } from './text-metrics';

function DiagramLabelView({ label }: { label: PlacedLabel }) {
  return (
    <G>
      <Rect
        x={label.x}
        y={label.y}
        width={label.width}
        height={label.height}
        rx={4}
        fill={diagramLook.chipFill}
        stroke={diagramLook.chipStroke}
        strokeWidth={1}
      />
      <SvgText
        x={label.x + LABEL_PAD_X}
        y={label.y + label.height / 2 + LABEL_FONT_SIZE * 0.36}
        fontSize={LABEL_FONT_SIZE}
        fontFamily={label.strong ? diagramLook.fontStrong : diagramLook.fontRegular}
        fill={diagramLook.text}
      >
        {label.text}
      </SvgText>
    </G>
  );
}

const sameChip = (a: { label: PlacedLabel }, b: { label: PlacedLabel }) =>
  a.label.x === b.label.x &&
  a.label.y === b.label.y &&
  a.label.width === b.label.width &&
  a.label.height === b.label.height &&
  a.label.text === b.label.text &&
  a.label.strong === b.label.strong;

/**
 * A value or load label: text on a small paper chip, so it reads over lines and fills. Drawn again only
 * when its place or words change (a new result makes new label objects for the same chips).
 */
export const DiagramLabel = memo(DiagramLabelView, sameChip);
