import type { BeamLoad } from '@/lib/calc/types';
import { spanModelFromState } from './simple-span';
import type { SpanModel } from './span-model';
import { supportedBeamState, type SupportedBeam } from './supported-beam-state';

/** Inputs of a supported beam: length and supports (ft), loads from the left end, stiffness E·I in lb·in². */
export interface SupportedBeamInput extends SupportedBeam {
  loads: readonly BeamLoad[];
  eiLbIn2: number;
}

/**
 * A member on pinned supports that overhangs one or both of them, or runs continuous over a centre post,
 * under any mix of full uniform, partial uniform and point loads.
 *
 * @param input.lengthFt member length, ft; input.supportsFt two or three supports, ft from the left end
 * @param input.loads loads in plf / lb positioned in ft from the left end; input.eiLbIn2 E (psi) × I (in⁴)
 * @returns a SpanModel: shear lb, moment lb·ft, deflection in (downward positive)
 * @throws CalcInputError for supports or loads off the member, or a non-positive stiffness
 * @example
 * createSupportedBeam({ lengthFt: 20, supportsFt: [0, 10, 20], eiLbIn2: 1.6e6 * 98.9, loads: [{ kind: 'uniform', wPlf: 100 }] })
 *   .reactions()[1].reactionLb; // 1250 = 1.25wl (two equal spans)
 * Reference: AWC Design Aid No. 6 (2007), beam overhanging one support, continuous beams; AISC Manual
 * Table 3-23.
 */
export function createSupportedBeam(input: SupportedBeamInput): SpanModel {
  return spanModelFromState(supportedBeamState(input, input.loads), input.eiLbIn2);
}
