/**
 * Contracts shared by the engine's modules. Internal units are the standard's own: lengths along the member
 * in ft, section dimensions in in, loads in lb and plf, stresses in psi.
 */

/** ASCE 7 load types the engine carries: dead, occupancy live, roof live, snow. */
export type LoadType = 'D' | 'L' | 'Lr' | 'S';
export const LOAD_TYPES: readonly LoadType[] = ['D', 'L', 'Lr', 'S'];

/**
 * One load on a simple-span member, positioned from the left support.
 * - `uniform`: w (plf) from startFt to endFt (full span when both omitted).
 * - `point`: P (lb) at atFt.
 */
export type BeamLoad =
  | { kind: 'uniform'; wPlf: number; startFt?: number; endFt?: number }
  | { kind: 'point'; pLb: number; atFt: number };

/** A beam load tagged with its load type and a label naming where it came from (for the takedown). */
export type TypedBeamLoad = BeamLoad & { type: LoadType; label: string };

/** One ASD load combination: the factor on each load type and the load duration factor C_D it carries. */
export interface LoadCombination {
  /** e.g. "D + 0.75L + 0.75(0.7S)" */
  name: string;
  factors: Partial<Record<LoadType, number>>;
  /** NDS Table 2.3.2 load duration factor for the shortest-duration load in the combination. */
  CD: number;
}

/** How an input value was obtained; echoed in results and design requests. */
export type InputFlag = 'measured' | 'assumed' | 'default';

/** Adjustment factor with its value and the reason it has that value, for the result's factor table. */
export interface FactorUse {
  /** Symbol as NDS prints it: "C_D", "C_F", "C_L", ... */
  symbol: string;
  value: number;
  note?: string;
}

/**
 * Thrown for input the engine cannot work with. `field` names the input (dot path) so the screen can show
 * the message beside it and the API can answer 400 with field errors.
 */
export class CalcInputError extends Error {
  constructor(
    public readonly field: string,
    message: string,
  ) {
    super(message);
    this.name = 'CalcInputError';
  }
}
