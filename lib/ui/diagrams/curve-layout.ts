import type { MemberCheckResult } from '@/shared/schemas/calc/member';
import { curveValue, pickCurveValues, type CurvePick } from './curve-picks';
import { placeLabels, type LabelRequest, type PlacedLabel } from './label-placement';
import { linearScale, spanScale } from './span-frame';
import { LABEL_HEIGHT } from './text-metrics';
import { formatCurveValue, type CurveKind } from './value-text';

/** Height of the plotted band between the label rows, px. */
export const PLOT_HEIGHT = 96;
/** Room above and below the plot for value labels, px. */
const LABEL_BAND = LABEL_HEIGHT + 6;

/** Everything needed to draw one curve (px, y downward). */
export interface CurveLayout {
  kind: CurveKind;
  width: number;
  height: number;
  /** y of the zero line. */
  baselineY: number;
  /** x of every bearing centre, left to right. */
  supportXs: number[];
  /** x of the member's ends as analysed (support centres, or overhang tips): the zero line's ends. */
  endXs: [number, number];
  /** The curve as an SVG path, and the closed area between it and the zero line. */
  linePath: string;
  areaPath: string;
  labels: PlacedLabel[];
  /** Picks that found no free place (lowest priority first to go). */
  dropped: string[];
  picks: CurvePick[];
}

/**
 * Sign conventions of the drawings: shear positive up (AWC Design Aid No. 6: positive just right of the left
 * support); sagging moment drawn up; deflection drawn down, as the member moves.
 */
export const DRAWN_UP: Record<CurveKind, boolean> = { shear: true, moment: true, deflection: false };

const n1 = (v: number) => Math.round(v * 10) / 10;

/**
 * Lays out the shear, moment or deflection curve of a member check for a given width: x by the span scale
 * shared with the load diagram (samples are in the analysis frame, over every span and overhang), y from
 * zero to the curve's extremes over PLOT_HEIGHT px, and value labels at the maxima and at every support
 * placed without overlap.
 *
 * @param result a member check run with `{ diagrams: true }`
 * @param kind which curve
 * @param widthPx drawing width, px
 * @returns the layout, or null when the result carries no samples
 * @example layoutCurve(checkMember(input, { diagrams: true }), 'moment', 390)?.labels[0].text // "19,870 lb·ft"
 */
export function layoutCurve(result: MemberCheckResult, kind: CurveKind, widthPx: number): CurveLayout | null {
  const samples = result.diagram?.samples ?? [];
  if (samples.length < 2) return null;
  const scale = spanScale(result, widthPx);
  const values = samples.map((s) => curveValue(s, kind));
  const lo = Math.min(0, ...values);
  const hi = Math.max(0, ...values);
  const domain: [number, number] = hi === lo ? [0, 1] : [lo, hi];
  const plotTop = LABEL_BAND;
  const plotBottom = LABEL_BAND + PLOT_HEIGHT;
  const y = linearScale(domain, DRAWN_UP[kind] ? [plotBottom, plotTop] : [plotTop, plotBottom]);
  const baselineY = y(0);
  const points = samples.map((s, i) => `${n1(scale.px(s.xFt))} ${n1(y(values[i]))}`);
  const linePath = `M${points.join('L')}`;
  const first = n1(scale.px(samples[0].xFt));
  const last = n1(scale.px(samples[samples.length - 1].xFt));
  const areaPath = `M${first} ${n1(baselineY)}L${points.join('L')}L${last} ${n1(baselineY)}Z`;

  const picks = pickCurveValues(samples, kind, scale.frame.supports);
  const biggest = values.reduce((a, b) => (Math.abs(b) > Math.abs(a) ? b : a), 0);
  const bulkAbove = y(biggest) < baselineY;
  const requests: LabelRequest[] = picks.map((p) => {
    const anchorY = y(p.value);
    const above = p.value === 0 ? !bulkAbove : anchorY < baselineY;
    return {
      id: p.role,
      text: formatCurveValue(kind, p.value),
      anchorX: scale.px(p.xFt),
      anchorY,
      side: above ? 'above' : 'below',
      priority: p.priority,
      strong: p.extreme,
    };
  });
  const height = plotBottom + LABEL_BAND;
  const { placed, dropped } = placeLabels(requests, { x: 0, y: 0, width: widthPx, height });
  return {
    kind,
    width: widthPx,
    height,
    baselineY,
    supportXs: scale.supports.map((s) => s.centrePx),
    endXs: [scale.px(0), scale.px(scale.frame.analysedLengthFt)],
    linePath,
    areaPath,
    labels: placed,
    dropped,
    picks,
  };
}
