/**
 * Least roof insulation R (ft²·h·°F/Btu) for a warm roof to take the slippery-surface curve: 30 for an
 * unventilated roof, 20 for a ventilated one (ASCE 7-16 §7.4.1; values from memory, confirm in the standard).
 */
export const WARM_ROOF_SLIPPERY_MIN_R = Object.freeze({ unventilated: 30, ventilated: 20 });

/** Whether a roof takes the slippery-surface C_s curve, and why not when it asked for it. */
export interface SlipperyCurve {
  used: boolean;
  /** Set when the surface is slippery but the curve is not allowed. */
  note: string | null;
}

/**
 * Whether the lower, slippery-surface C_s curve applies. Cold roofs (C_t > 1.0) take it on an unobstructed
 * slippery surface alone (§7.4.2). Warm roofs (C_t ≤ 1.0) take it only when the roof's insulation meets
 * §7.4.1 (R ≥ 30 unventilated, R ≥ 20 ventilated); an unknown R does not meet it.
 *
 * @param input.slippery unobstructed slippery surface; ct C_t; ventilated a ventilated attic;
 *   insulationR the roof's R-value in ft²·h·°F/Btu, undefined when not known
 * @returns whether the curve is used, with a note when the surface asked for it and it is not
 * @example slipperyCurve({ slippery: true, ct: 1.0, ventilated: false, insulationR: 38 }).used; // true
 * Reference: ASCE 7-16 §7.4.1 (warm roofs) and §7.4.2 (cold roofs); ASCE 7-22 §7.4 (same rule, from memory).
 */
export function slipperyCurve(input: {
  slippery: boolean;
  ct: number;
  ventilated: boolean;
  insulationR: number | undefined;
}): SlipperyCurve {
  if (!input.slippery) return { used: false, note: null };
  if (input.ct > 1.0) return { used: true, note: null };
  const needR = input.ventilated
    ? WARM_ROOF_SLIPPERY_MIN_R.ventilated
    : WARM_ROOF_SLIPPERY_MIN_R.unventilated;
  if (input.insulationR !== undefined && input.insulationR >= needR) return { used: true, note: null };
  const known = input.insulationR === undefined ? 'R not given' : `R-${input.insulationR} given`;
  return {
    used: false,
    note:
      `Slippery-surface curve not used: a warm roof (C_t ≤ 1.0) takes it only with roof insulation of at least ` +
      `R-${needR} (${input.ventilated ? 'ventilated' : 'unventilated'}; ASCE 7-16 §7.4.1, R-values from memory, ` +
      `confirm); ${known}. The other-surface curve is used.`,
  };
}
