import { formatFtIn, formatIn, formatLb, formatNumber } from '@/lib/format';
import type { MemberCheckResult } from '@/shared/schemas/calc/member';
import { pickCurveValues, type CurvePick } from './curve-picks';
import { addsUp, groupLoads, type DrawnLoad, type LoadType } from './load-groups';
import { designToClearFt } from './span-frame';
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

/** A design-frame position as ft-in from the face of the left support ("within the left bearing" before it). */
function positionText(xFt: number, result: MemberCheckResult): string {
  const clearFt = designToClearFt(xFt, result.spans);
  if (clearFt < -EDGE_FT) return 'within the left bearing';
  if (clearFt > result.spans.clearSpanFt + EDGE_FT) return 'within the right bearing';
  return formatPositionFt(Math.min(Math.max(clearFt, 0), result.spans.clearSpanFt));
}

/** Where a design-frame position is, in words, measured from the face of the left support. */
function whereText(xFt: number, result: MemberCheckResult): string {
  const text = positionText(xFt, result);
  return text.startsWith('within') ? text : `${text} from the left support face`;
}

function partsText(load: DrawnLoad): string {
  const unit = load.kind === 'point' ? 'lb' : 'plf';
  const parts = load.parts.map((p) => `${TYPE_WORDS[p.type]} ${formatNumber(p.value)} ${unit}`);
  const total = load.kind === 'point' ? load.totalLb : load.totalPlf;
  if (parts.length === 1) return parts[0];
  return addsUp(load) ? `${parts.join(' + ')} = ${formatNumber(total)} ${unit}` : parts.join(', ');
}

function loadSentence(load: DrawnLoad, result: MemberCheckResult): string {
  if (load.kind === 'point') return `${load.label}: ${partsText(load)} at ${whereText(load.atFt, result)}.`;
  const extent = load.full
    ? 'over the full span'
    : `from ${positionText(load.startFt, result)} to ${whereText(load.endFt, result)}`;
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
  const { spans, reactions } = result;
  const bearings =
    spans.bearingLeftIn === spans.bearingRightIn
      ? `${formatIn(spans.bearingLeftIn)} bearing at each end`
      : `${formatIn(spans.bearingLeftIn)} bearing at the left end and ${formatIn(spans.bearingRightIn)} at the right`;
  const loads = groupLoads(result.takedown, spans.designSpanFt).map((l) => loadSentence(l, result));
  return [
    `${DIAGRAM_TITLES.loads}, service loads by source.`,
    `Clear span ${formatFtIn(spans.clearSpanFt * 12)} between support faces; design span ${formatFtIn(spans.designSpanFt * 12)} between bearing centres; ${bearings}.`,
    ...(loads.length > 0 ? loads : ['No loads.']),
    `Largest reactions (${reactions.combination}): ${formatLb(reactions.leftLb)} at the left, ${formatLb(reactions.rightLb)} at the right.`,
  ].join(' ');
}

const ROLE_WORDS: Record<CurvePick['role'], string> = {
  max: 'largest',
  min: 'most negative',
  'left-support': 'at the left support',
  'right-support': 'at the right support',
};

const CURVE_NOTES: Record<CurveKind, string> = {
  shear: 'positive drawn up',
  moment: 'sagging moment drawn up',
  deflection: 'drawn downward as the member moves; short-term, the check table adds creep to the total',
};

function pickText(kind: CurveKind, pick: CurvePick, result: MemberCheckResult): string {
  const value = formatCurveValue(kind, pick.value);
  if (pick.role === 'left-support' || pick.role === 'right-support') {
    return `${value} ${ROLE_WORDS[pick.role]}${pick.priority === 0 && pick.extreme ? ' (the largest in size)' : ''}`;
  }
  const direction = kind === 'deflection' ? (pick.value > 0 ? ' downward' : ' upward') : '';
  return `${ROLE_WORDS[pick.role]} ${value}${direction} at ${whereText(pick.xFt, result)}`;
}

/**
 * One curve in words: its combination, its largest (and most negative) value with where it occurs, and its
 * values at both supports, the same values the drawing labels.
 *
 * @param result a member check run with `{ diagrams: true }`
 * @param kind which curve
 * @example curveText(result, 'moment') // "Bending moment under D + L, lb·ft (sagging moment drawn up): largest …"
 */
export function curveText(result: MemberCheckResult, kind: CurveKind): string {
  const diagram = result.diagram;
  if (!diagram || diagram.samples.length < 2) return `${DIAGRAM_TITLES[kind]}: not computed for this result.`;
  const picks = pickCurveValues(diagram.samples, kind);
  const extremes = picks.filter((p) => p.role === 'max' || p.role === 'min');
  const supports = picks.filter((p) => p.role !== 'max' && p.role !== 'min');
  const parts = [...extremes, ...supports].map((p) => pickText(kind, p, result));
  const head = `${DIAGRAM_TITLES[kind]} under ${diagram.combination}, ${CURVE_UNITS[kind]} (${CURVE_NOTES[kind]})`;
  return `${head}: ${parts.join('; ')}.`;
}
