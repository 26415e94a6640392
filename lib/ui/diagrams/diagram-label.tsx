import { G, Rect, Text as SvgText } from 'react-native-svg';
import type { PlacedLabel } from './label-placement';
import { diagramLook } from './diagram-style';
import { LABEL_FONT_SIZE, LABEL_PAD_X } from './text-metrics';

/** A value or load label: text on a small paper chip, so it reads over lines and fills. */
export function DiagramLabel({ label }: { label: PlacedLabel }) {
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
