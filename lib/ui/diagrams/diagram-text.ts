import { formatFtIn, formatIn, formatLb, formatNumber } from '@/lib/format';
import type { MemberCheckResult, SupportName } from '@/shared/schemas/calc/member';
import { pickCurveValues, type CurvePick } from './curve-picks';
import { addsUp, groupLoads, type DrawnLoad, type LoadType } from './load-groups';
import { memberFrame, toEnteredFt, type MemberFrame } from './span-frame';
import { CURVE_UNITS, formatCurveValue, formatPositionFt, type CurveKind } from './value-text';

/** Positions this close past a support face (ft) are rounding, not inside the bearing. */
const EDGE_FT = 1e-6;

const TYPE_WORDS: Record<LoadType, string> = { D: 'dead', L: 'live', Lr: 'roof live', S: 'snow' };

/** Titles of the four diagrams. */
export const DIAGRAM_TITLES = {
  loads: 'Loads on the member',
  shear: 'Shear',
  moment: 'Bending moment',
  deflection: 'Deflection',
} as const;

const SUPPORT_WORDS: Record<SupportName, string> = { left: 'left', centre: 'centre', right: 'right' };

/**
 * An analysis-frame position as the user enters it: ft-in from the face of the left support (or from the
 * tip of a left overhang); "over the … support" inside a bearing.
 */
function positionText(xFt: number, frame: MemberFrame): string {
  for (const s of frame.supports) {
    const halfFt = s.bearingIn / 2 / 12;
    if (Math.abs(xFt - s.atFt) < halfFt - EDGE_FT) return `over the ${SUPPORT_WORDS[s.name]} support`;
  }
  const enteredFt = toEnteredFt(xFt, frame);
  return formatPositionFt(Math.abs(enteredFt) < EDGE_FT ? 0 : enteredFt);
}

/** Where a position is, in words, measured from where the user measures: the left support face or tip. */
function whereText(xFt: number, frame: MemberFrame): string {
  const text = positionText(xFt, frame);
  if (text.startsWith('over')) return text;
  return `${text} from ${frame.fromLeftTip ? 'the tip of the left overhang' : 'the left support face'}`;
}

function partsText(load: DrawnLoad): string {
  const unit = load.kind === 'point' ? 'lb' : 'plf';
  const parts = load.parts.map((p) => `${TYPE_WORDS[p.type]} ${formatNumber(p.value)} ${unit}`);
  const total = load.kind === 'point' ? load.totalLb : load.totalPlf;
  if (parts.length === 1) return parts[0];
  return addsUp(load) ? `${parts.join(' + ')} = ${formatNumber(total)} ${unit}` : parts.join(', ');
}

function loadSentence(load: DrawnLoad, frame: MemberFrame, whole: string): string {
  if (load.kind === 'point') return `${load.label}: ${partsText(load)} at ${whereText(load.atFt, frame)}.`;
  const extent = load.full
    ? whole
    : `from ${positionText(load.startFt, frame)} to ${whereText(load.endFt, frame)}`;
  return `${load.label}: ${partsText(load)} ${extent}.`;
}

/**
 * The loaded member in words, for screen readers and as the diagram's text equivalent: spans and bearings,
 * every load with its types, amount and position (ft-in from the face of the left support, as measured on
 * site), and the largest reactions with their combination.
 *
 * @param result a member check result
 * @example loadDiagramText(result) // "Loads on the member, service loads by source. Clear span 14' 0" …"
 */
export function loadDiagramText(result: MemberCheckResult): string {
  const { spans } = result;
  const frame = memberFrame(result);
  const whole =
    frame.supports.length > 2 || frame.fromLeftTip || spans.overhangRightFt
      ? 'over the whole member'
      : 'over the full span';
  const loads = groupLoads(result.takedown, frame.analysedLengthFt).map((l) => loadSentence(l, frame, whole));
  return [
    `${DIAGRAM_TITLES.loads}, service loads by source.`,
    spansSentence(spans),
    ...(loads.length > 0 ? loads : ['No loads.']),
    reactionsSentence(result),
  ].join(' ');
}

const ftIn = (ft: number) => formatFtIn(ft * 12);

/** Spans, overhangs and bearings in words. */
function spansSentence(spans: MemberCheckResult['spans']): string {
  const parts: string[] = [];
  if (spans.secondClearSpanFt !== undefined && spans.secondDesignSpanFt !== undefined) {
    parts.push(
      `Two spans continuous over a centre support: clear spans ${ftIn(spans.clearSpanFt)} and ${ftIn(spans.secondClearSpanFt)} between support faces; design spans ${ftIn(spans.designSpanFt)} and ${ftIn(spans.secondDesignSpanFt)} between bearing centres`,
    );
    parts.push(
      `bearing ${formatIn(spans.bearingLeftIn)} at the left end, ${formatIn(spans.centreBearingIn ?? 0)} at the centre and ${formatIn(spans.bearingRightIn)} at the right`,
    );
  } else {
    parts.push(
      `Clear span ${ftIn(spans.clearSpanFt)} between support faces; design span ${ftIn(spans.designSpanFt)} between bearing centres`,
    );
    parts.push(
      spans.bearingLeftIn === spans.bearingRightIn
        ? `${formatIn(spans.bearingLeftIn)} bearing at each end`
        : `${formatIn(spans.bearingLeftIn)} bearing at the left end and ${formatIn(spans.bearingRightIn)} at the right`,
    );
  }
  if (spans.overhangLeftFt) parts.push(`overhangs ${ftIn(spans.overhangLeftFt)} past the left support`);
  if (spans.overhangRightFt) parts.push(`overhangs ${ftIn(spans.overhangRightFt)} past the right support`);
  return `${parts.join('; ')}.`;
}

/** The largest reaction at each support in words. */
function reactionsSentence(result: MemberCheckResult): string {
  const { reactions } = result;
  const centre = reactions.bySupport?.find((s) => s.support === 'centre');
  const middle = centre
    ? `, ${formatLb(centre.largestLb)} at the centre support (${centre.largestCombination})`
    : '';
  return `Largest reactions (${reactions.combination}): ${formatLb(reactions.leftLb)} at the left${middle}, ${formatLb(reactions.rightLb)} at the right.`;
}

const ROLE_WORDS: Record<CurvePick['role'], string> = {
  max: 'largest',
  min: 'most negative',
  'left-support': 'at the left support',
  'centre-support': 'at the centre support',
  'right-support': 'at the right support',
};

const CURVE_NOTES: Record<CurveKind, string> = {
  shear: 'positive drawn up',
  moment: 'sagging moment drawn up',
  deflection: 'drawn downward as the member moves; short-term, the check table adds creep to the total',
};

function pickText(kind: CurveKind, pick: CurvePick, frame: MemberFrame): string {
  const value = formatCurveValue(kind, pick.value);
  if (pick.role !== 'max' && pick.role !== 'min') {
    return `${value} ${ROLE_WORDS[pick.role]}${pick.priority === 0 && pick.extreme ? ' (the largest in size)' : ''}`;
  }
  const direction = kind === 'deflection' ? (pick.value > 0 ? ' downward' : ' upward') : '';
  return `${ROLE_WORDS[pick.role]} ${value}${direction} at ${whereText(pick.xFt, frame)}`;
}

/**
 * One curve in words: its combination, its largest (and most negative) value with where it occurs, and its
 * values at every support, the same values the drawing labels.
 *
 * @param result a member check run with `{ diagrams: true }`
 * @param kind which curve
 * @example curveText(result, 'moment') // "Bending moment under D + L, lb·ft (sagging moment drawn up): largest …"
 */
export function curveText(result: MemberCheckResult, kind: CurveKind): string {
  const diagram = result.diagram;
  if (!diagram || diagram.samples.length < 2) return `${DIAGRAM_TITLES[kind]}: not computed for this result.`;
  const frame = memberFrame(result);
  const picks = pickCurveValues(diagram.samples, kind, frame.supports);
  const extremes = picks.filter((p) => p.role === 'max' || p.role === 'min');
  const supports = picks.filter((p) => p.role !== 'max' && p.role !== 'min');
  const parts = [...extremes, ...supports].map((p) => pickText(kind, p, frame));
  const head = `${DIAGRAM_TITLES[kind]} under ${diagram.combination}, ${CURVE_UNITS[kind]} (${CURVE_NOTES[kind]})`;
  return `${head}: ${parts.join('; ')}.`;
}
