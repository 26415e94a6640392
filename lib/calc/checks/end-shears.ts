import type { BeamLoad } from '@/lib/calc/types';

/**
 * Design shear V at each end of a simple span from non-negative loads, lb, per NDS 3.4.3.1: uniform loads
 * within d of a support are left out and point loads within d are multiplied by x/d, then V is the end
 * reaction of the loads so reduced. A reduced point load near a support still adds to that support's V (it
 * is not subtracted as a load to the left of a section at d, which would let a heavy post beside a support
 * lower the shear). For uniform loads alone the values equal the shear at d, w(L/2 − d). Point loads sitting
 * on a support go straight into it. With d = 0 the values are the end shears of the whole span.
 *
 * @param spanFt design span, ft
 * @param loads non-negative loads from the left support (ft, plf, lb)
 * @param dFt member depth, ft (0 for shear at the support)
 * @returns [left, right] shear magnitudes, lb
 * @example endShearsAtD(12, [{ kind: 'uniform', wPlf: 100 }], 0.5); // [550, 550] = w(L/2 − d)
 *
 * Reference: NDS 2018 §3.4.3.1 (x/d for concentrated loads from memory); AWC Design Aid No. 6 (2007) case 1.
 */
export function endShearsAtD(spanFt: number, loads: readonly BeamLoad[], dFt: number): [number, number] {
  const L = spanFt;
  const lo = Math.min(dFt, L / 2);
  const hi = L - lo;
  let rA = 0;
  let rB = 0;
  for (const load of loads) {
    if (load.kind === 'point') {
      const a = load.atFt;
      const fromSupportFt = Math.min(a, L - a);
      if (fromSupportFt <= 0) continue;
      const p = fromSupportFt >= dFt ? load.pLb : (load.pLb * fromSupportFt) / dFt;
      rA += (p * (L - a)) / L;
      rB += (p * a) / L;
      continue;
    }
    const a = Math.max(load.startFt ?? 0, lo);
    const b = Math.min(load.endFt ?? L, hi);
    if (b <= a) continue;
    const total = load.wPlf * (b - a);
    const centroid = (a + b) / 2;
    rA += (total * (L - centroid)) / L;
    rB += (total * centroid) / L;
  }
  return [rA, rB];
}
