const MAX_BEARING_LENGTH_IN = 6;
const MIN_DISTANCE_FROM_END_IN = 3;
const EDGE_ALLOWANCE_IN = 0.375;

/**
 * Bearing area factor C_b on F_c⊥: (l_b + 0.375)/l_b for bearings shorter than 6 in measured along the
 * grain and at least 3 in from the end of the member; 1.0 otherwise (including bearings at member ends, the
 * usual case for a beam on its jack studs).
 * @param bearingLengthIn l_b, bearing length along the grain (in), > 0
 * @param distanceFromEndIn clear distance from the end of the member to the bearing (in)
 * @returns C_b (dimensionless)
 * @example bearingAreaFactor(1.5, 12) // 1.25
 * Reference: NDS 2018 §3.10.4, Table 3.10.4.
 */
export function bearingAreaFactor(bearingLengthIn: number, distanceFromEndIn: number): number {
  if (bearingLengthIn >= MAX_BEARING_LENGTH_IN || distanceFromEndIn < MIN_DISTANCE_FROM_END_IN) return 1;
  return (bearingLengthIn + EDGE_ALLOWANCE_IN) / bearingLengthIn;
}
