import { CalcInputError, type BeamLoad } from '@/lib/calc/types';

/** A point load P (lb) at aFt. */
export interface PointPiece {
  aFt: number;
  pLb: number;
}

/** A uniform load w (plf) from aFt to bFt, aFt < bFt. */
export interface UniformPiece {
  aFt: number;
  bFt: number;
  wPlf: number;
}

/** Loads split by kind, positions checked against the span. */
export interface SpanLoads {
  points: PointPiece[];
  uniforms: UniformPiece[];
}

/**
 * Checks and splits beam loads for a span. A uniform load without start and end covers the full span; a
 * zero-length uniform load or a zero load carries nothing and is dropped.
 *
 * @param spanFt design span, ft (> 0)
 * @param loads loads positioned from the left support (ft, plf, lb)
 * @returns point and uniform pieces in ft, lb, plf
 * @throws CalcInputError naming `loads.<i>.<field>` for a position outside the span or a non-finite value
 * @example
 * splitSpanLoads(10, [{ kind: 'uniform', wPlf: 100 }]); // { points: [], uniforms: [{ aFt: 0, bFt: 10, wPlf: 100 }] }
 *
 * Reference: AWC Design Aid No. 6 (2007) load cases (uniform, partial uniform, concentrated).
 */
export function splitSpanLoads(spanFt: number, loads: readonly BeamLoad[]): SpanLoads {
  if (!Number.isFinite(spanFt) || spanFt <= 0)
    throw new CalcInputError('spanFt', 'The span must be above 0 ft');
  const points: PointPiece[] = [];
  const uniforms: UniformPiece[] = [];
  loads.forEach((load, i) => {
    if (load.kind === 'point') {
      if (!Number.isFinite(load.pLb)) throw new CalcInputError(`loads.${i}.pLb`, 'Enter a point load in lb');
      const aFt = checkPosition(spanFt, load.atFt, `loads.${i}.atFt`);
      if (load.pLb !== 0) points.push({ aFt, pLb: load.pLb });
      return;
    }
    if (!Number.isFinite(load.wPlf)) throw new CalcInputError(`loads.${i}.wPlf`, 'Enter a load in plf');
    const aFt = checkPosition(spanFt, load.startFt ?? 0, `loads.${i}.startFt`);
    const bFt = checkPosition(spanFt, load.endFt ?? spanFt, `loads.${i}.endFt`);
    if (bFt < aFt) throw new CalcInputError(`loads.${i}.endFt`, 'The load must end after it starts');
    if (bFt > aFt && load.wPlf !== 0) uniforms.push({ aFt, bFt, wPlf: load.wPlf });
  });
  return { points, uniforms };
}

/** Positions this close to a support (fraction of the span) are taken as on it: rounding, not a user error. */
const POSITION_SLACK = 1e-9;

function checkPosition(spanFt: number, xFt: number, field: string): number {
  const slackFt = POSITION_SLACK * spanFt;
  if (!Number.isFinite(xFt) || xFt < -slackFt || xFt > spanFt + slackFt) {
    throw new CalcInputError(field, `The position must lie on the span, 0 to ${spanFt} ft`);
  }
  return Math.min(spanFt, Math.max(0, xFt));
}
