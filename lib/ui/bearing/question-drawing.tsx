import type { ReactNode } from 'react';
import Svg, { Line, Path, Rect, Text as SvgText } from 'react-native-svg';
import { colors, fonts } from '@/lib/theme';
import type { ScreenQuestionId } from '@/shared/schemas/bearing-screen-answers';

const W = 240;
const H = 130;
const ink = colors.ink;
const wood = colors.lineStrong;
const mark = colors.accent;

/** The wall being screened, in section: studs between plates, floor line at y 120. */
function Wall({ x = 110, top = 60 }: { x?: number; top?: number }) {
  return (
    <>
      <Rect x={x} y={top} width={20} height={120 - top} fill={colors.surfaceSunken} stroke={ink} />
      <Line x1={x - 4} y1={top} x2={x + 24} y2={top} stroke={ink} strokeWidth={3} />
      <Line x1={0} y1={120} x2={W} y2={120} stroke={wood} strokeWidth={2} />
    </>
  );
}

/** Joists seen end-on (small boxes) or along their length (a long bar) at height y. */
const joistsAcross = (y: number, from = 10, to = 230) => (
  <Line x1={from} y1={y} x2={to} y2={y} stroke={wood} strokeWidth={8} />
);
const joistEnds = (y: number) =>
  [20, 60, 100, 140, 180, 220].map((x) => (
    <Rect key={x} x={x - 5} y={y - 6} width={10} height={12} fill={wood} />
  ));
const rafters = (
  <>
    <Path d="M10 60 L120 8 L230 60" stroke={wood} strokeWidth={5} fill="none" />
  </>
);
const label = (x: number, y: number, text: string) => (
  <SvgText x={x} y={y} fontSize={11} fill={mark} fontFamily={fonts.semibold} textAnchor="middle">
    {text}
  </SvgText>
);
const arrow = (x: number, y1: number, y2: number) => (
  <>
    <Line x1={x} y1={y1} x2={x} y2={y2} stroke={mark} strokeWidth={3} />
    <Path
      d={`M${x - 6} ${y2 - 8} L${x} ${y2} L${x + 6} ${y2 - 8}`}
      stroke={mark}
      strokeWidth={3}
      fill="none"
    />
  </>
);

const drawings: Record<ScreenQuestionId, ReactNode> = {
  exterior: (
    <>
      <Rect x={20} y={40} width={200} height={80} fill="none" stroke={ink} strokeWidth={2} />
      <Rect x={20} y={40} width={10} height={80} fill={mark} />
      {label(60, 32, 'outside wall')}
    </>
  ),
  above: (
    <>
      {rafters}
      {joistsAcross(60)}
      <Wall top={64} />
      {label(120, 45, 'attic?')}
    </>
  ),
  joistDirection: (
    <>
      {joistsAcross(56)}
      {joistEnds(80)}
      <Wall top={86} />
      {label(60, 46, 'across')}
      {label(170, 74, 'parallel (end-on)')}
    </>
  ),
  furring: (
    <>
      {joistEnds(50)}
      <Line x1={10} y1={60} x2={230} y2={60} stroke={mark} strokeWidth={4} />
      {[40, 100, 160, 220].map((x) => (
        <Line key={x} x1={x} y1={58} x2={x} y2={70} stroke={ink} strokeWidth={2} />
      ))}
      {label(120, 86, 'strip under the joists: screws follow it')}
    </>
  ),
  joistsLand: (
    <>
      <Line x1={10} y1={56} x2={112} y2={56} stroke={wood} strokeWidth={8} />
      <Line x1={128} y1={56} x2={230} y2={56} stroke={wood} strokeWidth={8} />
      <Wall top={61} />
      {label(120, 44, 'ends land on the plate')}
    </>
  ),
  joistLaps: (
    <>
      <Line x1={10} y1={52} x2={136} y2={52} stroke={wood} strokeWidth={8} />
      <Line x1={104} y1={44} x2={230} y2={44} stroke={colors.inkMuted} strokeWidth={8} />
      <Wall top={57} />
      {label(120, 32, 'lap over the wall')}
    </>
  ),
  joistsContinuous: (
    <>
      {joistsAcross(56)}
      <Wall top={61} />
      {arrow(120, 20, 50)}
      {label(60, 40, 'one piece, rests on it')}
    </>
  ),
  beamAbove: (
    <>
      <Rect x={90} y={30} width={60} height={26} fill={wood} />
      {joistEnds(64)}
      <Wall top={70} />
      {arrow(120, 8, 28)}
      {label(190, 40, 'beam or post')}
    </>
  ),
  hiddenPost: (
    <>
      <Rect x={60} y={40} width={120} height={80} fill={colors.surfaceSunken} stroke={ink} />
      {[70, 90, 150, 170].map((x) => (
        <Line key={x} x1={x} y1={40} x2={x} y2={120} stroke={wood} strokeWidth={3} />
      ))}
      <Rect x={112} y={40} width={18} height={80} fill={mark} />
      {label(121, 32, 'stud pack')}
    </>
  ),
  wallAbove: (
    <>
      <Rect x={110} y={8} width={20} height={44} fill={colors.surfaceSunken} stroke={mark} strokeWidth={2} />
      {joistsAcross(58)}
      <Wall top={64} />
      {label(180, 30, 'wall above')}
    </>
  ),
  balloonFraming: (
    <>
      <Rect x={110} y={8} width={16} height={112} fill={colors.surfaceSunken} stroke={ink} />
      <Rect x={126} y={54} width={6} height={10} fill={mark} />
      <Line x1={132} y1={58} x2={230} y2={58} stroke={wood} strokeWidth={8} />
      <Line x1={0} y1={120} x2={W} y2={120} stroke={wood} strokeWidth={2} />
      {label(60, 62, 'stud runs past floor')}
    </>
  ),
  ridge: (
    <>
      {rafters}
      <Rect x={115} y={6} width={10} height={20} fill={mark} />
      {joistsAcross(62)}
      {label(170, 24, 'ridge board?')}
    </>
  ),
  ceilingJoistsTie: (
    <>
      {rafters}
      <Line x1={10} y1={62} x2={136} y2={62} stroke={mark} strokeWidth={6} />
      <Line x1={104} y1={55} x2={230} y2={55} stroke={mark} strokeWidth={6} />
      <Wall top={66} />
      <Path d="M4 70 L14 70 M236 70 L226 70" stroke={ink} strokeWidth={3} />
      {label(60, 90, 'the tie')}
    </>
  ),
  trusses: (
    <>
      <Path d="M10 70 L120 14 L230 70 Z M60 70 L120 14 L180 70" stroke={wood} strokeWidth={3} fill="none" />
      <Path d="M10 74 L120 18 L230 74" stroke={mark} strokeWidth={3} fill="none" />
      <Wall top={76} />
      {label(190, 100, 'girder truss?')}
    </>
  ),
  purlinBraces: (
    <>
      {rafters}
      <Rect x={58} y={32} width={12} height={10} fill={wood} />
      <Line x1={64} y1={42} x2={118} y2={76} stroke={mark} strokeWidth={4} />
      {joistsAcross(80, 10, 230)}
      <Wall top={84} />
      {label(170, 70, 'brace lands here?')}
    </>
  ),
  bracedWall: (
    <>
      <Rect x={60} y={30} width={120} height={90} fill={colors.surfaceSunken} stroke={ink} />
      <Line x1={64} y1={116} x2={176} y2={34} stroke={mark} strokeWidth={4} />
      <Rect x={60} y={100} width={8} height={20} fill={ink} />
      <Rect x={172} y={100} width={8} height={20} fill={ink} />
      {label(120, 24, 'sheathing, let-in brace, hold-downs')}
    </>
  ),
  below: (
    <>
      <Rect x={110} y={10} width={20} height={50} fill={colors.surfaceSunken} stroke={ink} />
      <Line x1={0} y1={64} x2={W} y2={64} stroke={wood} strokeWidth={6} />
      <Rect x={100} y={70} width={40} height={22} fill={mark} />
      <Rect x={112} y={92} width={16} height={28} fill={colors.inkMuted} />
      {label(190, 86, 'beam or wall below?')}
    </>
  ),
  sag: (
    <>
      <Path d="M10 50 Q120 78 230 50" stroke={mark} strokeWidth={4} fill="none" />
      <Line x1={10} y1={50} x2={230} y2={50} stroke={colors.inkMuted} strokeDasharray="6 4" strokeWidth={2} />
      <Wall top={66} />
      {label(120, 40, 'string line vs. ceiling')}
    </>
  ),
};

/** A small section sketch of what to look for, for each question of the bearing screen. */
export function QuestionDrawing({ question }: { question: ScreenQuestionId }) {
  return (
    <Svg width="100%" height={H} viewBox={`0 0 ${W} ${H}`} role="img" aria-label={`Sketch: what to look for`}>
      {drawings[question]}
    </Svg>
  );
}
