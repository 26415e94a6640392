/** Width of one jack stud along the member, in (a 2x is 1-1/2 in thick; NDS Supplement Table 1B). */
export const JACK_STUD_IN = 1.5;
/** Clear spans above this take two jack studs by trade practice, ft (common practice). */
export const TWO_JACKS_OVER_FT = 6;

/**
 * Jack studs under each end of a header: enough 1-1/2 in studs to give the required bearing length, at least
 * one; two where the clear span is over about 6 ft (common practice, and how code header tables are laid out).
 *
 * @param requiredLengthIn bearing length needed at the more heavily loaded end, in
 * @param clearSpanFt clear span, ft
 * @returns the number of jack studs and a note saying why
 * @example jackStuds(2.1, 8); // { count: 2, note: 'bearing needs 2 ...' }
 * Reference: NDS 2018 §3.10 (bearing); DESIGN.md §1 (jack studs carry the header, common practice).
 */
export function jackStuds(requiredLengthIn: number, clearSpanFt: number): { count: number; note: string } {
  const byBearing = Math.max(1, Math.ceil(requiredLengthIn / JACK_STUD_IN - 1e-9));
  const byPractice = clearSpanFt > TWO_JACKS_OVER_FT ? 2 : 1;
  const count = Math.max(byBearing, byPractice);
  const note =
    byPractice > byBearing
      ? `bearing needs ${byBearing}; 2 jack studs for a clear span over ${TWO_JACKS_OVER_FT} ft (common practice)`
      : `bearing needs ${byBearing} at 1-1/2 in each`;
  return { count, note };
}
