import { CalcInputError, type BeamLoad } from '@/lib/calc/types';
import {
  eiSlope,
  eiYNoConstant,
  moment,
  segmentLoad,
  shearAfter,
  simpleSpanBreakpoints,
} from './simple-span-state';
import { emptySpanState, type SpanState } from './span-state';
import { splitSpanLoads, type PointPiece, type SpanLoads } from './span-loads';

/**
 * A member on pinned supports: its length and where the supports are, ft from the left end. Two supports
 * with the member running past either or both (overhangs, cantilevered ends), or three supports for a beam
 * continuous over a centre post (two spans, equal or not), with or without overhangs.
 */
export interface SupportedBeam {
  lengthFt: number;
  /** Two or three support positions, ascending, within 0..lengthFt. */
  supportsFt: readonly number[];
}

function checkBeam(beam: SupportedBeam): void {
  const { lengthFt, supportsFt } = beam;
  if (!Number.isFinite(lengthFt) || lengthFt <= 0)
    throw new CalcInputError('spanFt', 'The member length must be above 0 ft');
  if (supportsFt.length < 2 || supportsFt.length > 3)
    throw new CalcInputError('supports', 'A member here has two supports, or three (continuous)');
  for (let i = 0; i < supportsFt.length; i++) {
    const s = supportsFt[i];
    const previous = i === 0 ? 0 : supportsFt[i - 1];
    if (!Number.isFinite(s) || s < 0 || s > lengthFt || (i > 0 && s <= previous))
      throw new CalcInputError('supports', 'Supports must lie on the member, left to right, apart');
  }
}

/**
 * Breakpoints of a supported beam under several load sets: both ends, every support, every point load and
 * every end of a partial uniform load, sorted and unique. States built on them can be combined.
 * @param beam length and supports (ft); loadSets loads from the left end (ft, plf, lb)
 * @returns breakpoints, ft
 * @throws CalcInputError for supports off the member or a load off it
 * @example supportedBeamBreakpoints({ lengthFt: 14, supportsFt: [0, 10] }, []); // [0, 10, 14]
 * Reference: AWC Design Aid No. 6 (2007), beams overhanging one support and continuous beams.
 */
export function supportedBeamBreakpoints(
  beam: SupportedBeam,
  loadSets: readonly (readonly BeamLoad[])[],
): number[] {
  checkBeam(beam);
  const xs = [...simpleSpanBreakpoints(beam.lengthFt, loadSets), ...beam.supportsFt];
  xs.sort((a, b) => a - b);
  return xs.filter((x, i) => i === 0 || x !== xs[i - 1]);
}

/** Total load (lb) and its moment about x = aboutFt (lb·ft, load to the right positive). */
function resultant(pieces: SpanLoads, aboutFt: number): { totalLb: number; momentLbFt: number } {
  let totalLb = 0;
  let momentLbFt = 0;
  for (const p of pieces.points) {
    totalLb += p.pLb;
    momentLbFt += p.pLb * (p.aFt - aboutFt);
  }
  for (const u of pieces.uniforms) {
    const w = u.wPlf * (u.bFt - u.aFt);
    totalLb += w;
    momentLbFt += w * (0.5 * (u.aFt + u.bFt) - aboutFt);
  }
  return { totalLb, momentLbFt };
}

/** The loads with the support reactions added as upward (negative) point pieces. */
function withReactions(pieces: SpanLoads, supportsFt: readonly number[], reactionsLb: number[]): SpanLoads {
  const points: PointPiece[] = [...pieces.points];
  for (let i = 0; i < supportsFt.length; i++) points.push({ aFt: supportsFt[i], pLb: -reactionsLb[i] });
  return { points, uniforms: pieces.uniforms };
}

/**
 * Support reactions, lb upward. Two supports: statics about the first. Three: the beam on its outer
 * supports is made continuous over the centre one by the force that closes the gap there (compatibility,
 * the flexibility method): R_c = −y_c / f_c, with y_c the deflection at the centre support of the beam on
 * its outer supports and f_c = a²b²/(3·l) (per unit E·I) that of a unit upward force there (AWC Design Aid
 * No. 6, simple beam, concentrated load at any point). E·I, constant along the member, cancels.
 */
function reactions(pieces: SpanLoads, supportsFt: readonly number[]): number[] {
  const first = supportsFt[0];
  const last = supportsFt[supportsFt.length - 1];
  const l = last - first;
  const { totalLb, momentLbFt } = resultant(pieces, first);
  let rLast = momentLbFt / l;
  let rFirst = totalLb - rLast;
  if (supportsFt.length === 2) return [rFirst, rLast];
  const centre = supportsFt[1];
  const all = withReactions(pieces, [first, last], [rFirst, rLast]);
  const yFirst = eiYNoConstant(0, all, first);
  const yLast = eiYNoConstant(0, all, last);
  const yCentre = eiYNoConstant(0, all, centre) - (yFirst + ((yLast - yFirst) * (centre - first)) / l);
  const a = centre - first;
  const b = last - centre;
  const rCentre = -yCentre / ((a * a * b * b) / (3 * l));
  rFirst -= (rCentre * b) / l;
  rLast -= (rCentre * a) / l;
  return [rFirst, rCentre, rLast];
}

/**
 * The response of a member on pinned supports — overhanging one or both supports, or continuous over a
 * centre post — stored at breakpoints like a simple span's (see SpanState), so states combine by weighted
 * sums. Reactions from statics (two supports) or compatibility at the centre support (three); then shear,
 * moment and the elastic curve by singularity functions from the left end, with y = 0 at the outer supports
 * (and so at the centre one).
 *
 * @param beam length and supports, ft from the left end
 * @param loads loads from the left end (ft, plf, lb)
 * @param xs breakpoints, ft; default those of the beam and loads; must contain every one of them
 * @returns the state (lb, lb·ft, lb·ft², lb·ft³, plf), reactions one per support
 * @throws CalcInputError for supports or loads off the member
 * @example supportedBeamState({ lengthFt: 20, supportsFt: [0, 10, 20] }, [{ kind: 'uniform', wPlf: 100 }]).reactionsLb; // [375, 1250, 375]
 * Reference: AWC Design Aid No. 6 (2007): beam overhanging one support, beam continuous over two equal
 * spans (centre reaction 10wl/8 = 1.25wl), two unequal spans; AISC Manual Table 3-23.
 */
export function supportedBeamState(
  beam: SupportedBeam,
  loads: readonly BeamLoad[],
  xs: readonly number[] = supportedBeamBreakpoints(beam, [loads]),
): SpanState {
  checkBeam(beam);
  const { lengthFt, supportsFt } = beam;
  const pieces = splitSpanLoads(lengthFt, loads);
  const reactionsLb = reactions(pieces, supportsFt);
  const all = withReactions(pieces, supportsFt, reactionsLb);
  const first = supportsFt[0];
  const last = supportsFt[supportsFt.length - 1];
  const yFirst = eiYNoConstant(0, all, first);
  const c1 = -(eiYNoConstant(0, all, last) - yFirst) / (last - first);
  const c0 = -yFirst - c1 * first;
  const state = emptySpanState(lengthFt, xs, supportsFt);
  for (let r = 0; r < reactionsLb.length; r++) state.reactionsLb[r] = reactionsLb[r];
  for (let i = 0; i < xs.length; i++) {
    const x = xs[i];
    state.vAfterLb[i] = shearAfter(0, all.points, all.uniforms, x);
    state.momentLbFt[i] = moment(0, all, x);
    state.eiSlope[i] = eiSlope(0, all, x) + c1;
    state.eiY[i] = eiYNoConstant(0, all, x) + c1 * x + c0;
    if (i + 1 < xs.length) state.wPlf[i] = segmentLoad(all.uniforms, x, xs[i + 1]);
  }
  return state;
}
