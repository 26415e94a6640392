import { stateShearLb } from '@/lib/calc/analysis/span-state';
import { supportedBeamState, type SupportedBeam } from '@/lib/calc/analysis/supported-beam-state';
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

/** A point load within d of a support counts x/d of itself, x its distance to the nearest support (NDS 3.4.3.1). */
function reducedForShear(beam: SupportedBeam, loads: readonly BeamLoad[], dFt: number): BeamLoad[] {
  if (dFt <= 0) return [...loads];
  const out: BeamLoad[] = [];
  const windows = beam.supportsFt.map((s): [number, number] => [
    Math.max(0, s - dFt),
    Math.min(beam.lengthFt, s + dFt),
  ]);
  for (const load of loads) {
    if (load.kind === 'point') {
      let near = Infinity;
      for (const s of beam.supportsFt) near = Math.min(near, Math.abs(load.atFt - s));
      if (near <= 0) continue;
      out.push(near >= dFt ? load : { ...load, pLb: (load.pLb * near) / dFt });
      continue;
    }
    let pieces: [number, number][] = [[load.startFt ?? 0, load.endFt ?? beam.lengthFt]];
    for (const [lo, hi] of windows) {
      pieces = pieces.flatMap(([a, b]): [number, number][] =>
        hi <= a || lo >= b
          ? [[a, b]]
          : (
              [
                [a, Math.min(b, lo)],
                [Math.max(a, hi), b],
              ] as [number, number][]
            ).filter(([x, y]) => y > x),
      );
    }
    for (const [a, b] of pieces) out.push({ kind: 'uniform', wPlf: load.wPlf, startFt: a, endFt: b });
  }
  return out;
}

/**
 * Design shears next to the supports of a member that overhangs a support or runs continuous over a centre
 * post, per NDS 3.4.3.1 as for a simple span (endShearsAtD): uniform loads within d of a support are left
 * out and point loads within d are taken at x/d; the member is analysed under the loads so reduced and the
 * shear is read just beside each support, on each side where the member goes on. Point loads on a support
 * go straight into it.
 *
 * @param beam length and supports, ft; loads non-negative loads from the left end (ft, plf, lb)
 * @param dFt member depth, ft (0 for shear at the supports)
 * @returns signed shears (lb) per support side, left to right, and the support index of each side
 * @example supportSideShears({ lengthFt: 20, supportsFt: [0, 10, 20] }, [{ kind: 'uniform', wPlf: 100 }], 0).shearsLb; // [375, -625, 625, -375]
 * Reference: NDS 2018 §3.4.3.1; AWC Design Aid No. 6 (2007) two equal spans (shears 3wl/8 and 5wl/8).
 */
export function supportSideShears(
  beam: SupportedBeam,
  loads: readonly BeamLoad[],
  dFt: number,
): { shearsLb: number[]; sideSupport: number[] } {
  const state = supportedBeamState(beam, reducedForShear(beam, loads, dFt));
  const shearsLb: number[] = [];
  const sideSupport: number[] = [];
  beam.supportsFt.forEach((s, i) => {
    if (s > 0) {
      shearsLb.push(stateShearLb(state, s, 'before'));
      sideSupport.push(i);
    }
    if (s < beam.lengthFt) {
      shearsLb.push(stateShearLb(state, s, 'after'));
      sideSupport.push(i);
    }
  });
  return { shearsLb, sideSupport };
}
