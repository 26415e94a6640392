import Svg, { Line, Path, Rect, Text as SvgText } from 'react-native-svg';
import { colors, fonts } from '@/lib/theme';

const W = 320;
const H = 170;

/**
 * Section across the wall being removed: the joists above, the wall (dashed: it comes out), and the
 * temporary walls set back on one or both sides, standing on the floor below.
 */
export function ShoringSketch({ bothSides, setbackFt }: { bothSides: boolean; setbackFt: number }) {
  const mid = W / 2;
  const offset = 30 + Math.min(setbackFt, 4) * 15;
  const temp = (x: number, name: string) => (
    <>
      <Rect
        x={x - 6}
        y={44}
        width={12}
        height={96}
        fill={colors.accentSoft}
        stroke={colors.accent}
        strokeWidth={2}
      />
      <Line x1={x - 14} y1={44} x2={x + 14} y2={44} stroke={colors.accent} strokeWidth={4} />
      <Line x1={x - 14} y1={140} x2={x + 14} y2={140} stroke={colors.accent} strokeWidth={4} />
      <Line x1={x + 6} y1={60} x2={x + 26} y2={140} stroke={colors.accent} strokeWidth={2} />
      <SvgText x={x} y={160} fontSize={11} fill={colors.ink} textAnchor="middle" fontFamily={fonts.semibold}>
        {name}
      </SvgText>
    </>
  );
  return (
    <Svg
      width="100%"
      height={H}
      viewBox={`0 0 ${W} ${H}`}
      role="img"
      aria-label="Section sketch of the temporary walls"
    >
      <Line x1={8} y1={36} x2={W - 8} y2={36} stroke={colors.lineStrong} strokeWidth={10} />
      <SvgText x={24} y={22} fontSize={11} fill={colors.ink} fontFamily={fonts.regular}>
        joists above
      </SvgText>
      <Rect
        x={mid - 8}
        y={42}
        width={16}
        height={98}
        fill="none"
        stroke={colors.ink}
        strokeDasharray="5 4"
        strokeWidth={2}
      />
      <SvgText x={mid} y={160} fontSize={11} fill={colors.ink} textAnchor="middle" fontFamily={fonts.regular}>
        wall out
      </SvgText>
      <Line x1={0} y1={144} x2={W} y2={144} stroke={colors.lineStrong} strokeWidth={3} />
      {temp(mid - offset, 'wall A')}
      {bothSides ? temp(mid + offset, 'wall B') : null}
      <Path d={`M${mid - offset} 108 L${mid} 108`} stroke={colors.inkMuted} strokeWidth={1} />
      <SvgText
        x={mid - offset / 2}
        y={104}
        fontSize={10}
        fill={colors.inkMuted}
        textAnchor="middle"
        fontFamily={fonts.regular}
      >
        {`${setbackFt} ft`}
      </SvgText>
    </Svg>
  );
}
