import type { BeamLoad } from '@/lib/calc/types';

/**
 * The loads that count for the shear check "at d from the support": uniform loads within d of a support are
 * cut away ([d, L − d] kept) and a point load at x < d from a support is multiplied by x/d. Distances are
 * measured from the support centre line, which gives x/d a little larger than from the support face: on the
 * safe side.
 *
 * @param spanFt design span, ft
 * @param loads loads from the left support (ft, plf, lb)
 * @param dFt member depth, ft
 * @returns the loads that count for shear, same units
 * @example
 * loadsAwayFromSupports(10, [{ kind: 'uniform', wPlf: 100 }], 0.75); // [{ kind: 'uniform', wPlf: 100, startFt: 0.75, endFt: 9.25 }]
 *
 * Reference: NDS 2018 §3.4.3.1 (a) uniform loads within d of a support may be ignored; (b) concentrated loads
 * within d may be multiplied by x/d (from memory — earlier editions let them be ignored; x/d is the safer reading).
 */
export function loadsAwayFromSupports(spanFt: number, loads: readonly BeamLoad[], dFt: number): BeamLoad[] {
  const loFt = Math.min(dFt, spanFt / 2);
  const hiFt = spanFt - loFt;
  const kept: BeamLoad[] = [];
  for (const load of loads) {
    if (load.kind === 'point') {
      const fromSupportFt = Math.min(load.atFt, spanFt - load.atFt);
      const scale = fromSupportFt >= dFt ? 1 : fromSupportFt / dFt;
      if (scale > 0) kept.push(scale === 1 ? load : { ...load, pLb: load.pLb * scale });
      continue;
    }
    const startFt = Math.max(load.startFt ?? 0, loFt);
    const endFt = Math.min(load.endFt ?? spanFt, hiFt);
    if (endFt > startFt) kept.push({ kind: 'uniform', wPlf: load.wPlf, startFt, endFt });
  }
  return kept;
}
