import { formatNumber } from '@/lib/format';

/** Width of one jack stud along the member, in (a 2x is 1-1/2 in thick; NDS Supplement Table 1B). */
export const JACK_STUD_IN = 1.5;
/** Clear spans above this take two jack studs by trade practice, ft (common practice). */
export const TWO_JACKS_OVER_FT = 6;

/** Jack studs under each end: the count to use, what bearing needs, what practice adds, and why. */
export interface JackStuds {
  count: number;
  /** Studs the required bearing length needs (at least one). */
  forBearing: number;
  /** Studs the common-practice minimum adds on top of forBearing (0 when bearing needs as many or more). */
  addedByPractice: number;
  note: string;
}

/**
 * Jack studs under each end of a header: enough 1-1/2 in studs to give the required bearing length, at least
 * one; two where the clear span is over about 6 ft (common practice: code header tables lay out longer
 * headers on two jacks, which also gives a steadier seat and room to nail the header off).
 *
 * @param requiredLengthIn bearing length needed at the more heavily loaded end, in
 * @param clearSpanFt clear span, ft
 * @returns the count, what bearing needs, what practice adds, and a note saying both and why
 * @example jackStuds(1.2, 8); // { count: 2, forBearing: 1, addedByPractice: 1, note: 'Bearing needs 1 ...' }
 * Reference: NDS 2018 §3.10 (bearing); DESIGN.md §1 (jack studs carry the header, common practice).
 */
export function jackStuds(requiredLengthIn: number, clearSpanFt: number): JackStuds {
  const forBearing = Math.max(1, Math.ceil(requiredLengthIn / JACK_STUD_IN - 1e-9));
  const byPractice = clearSpanFt > TWO_JACKS_OVER_FT ? 2 : 1;
  const count = Math.max(forBearing, byPractice);
  const addedByPractice = count - forBearing;
  const needs =
    `Bearing needs ${forBearing} jack stud${forBearing === 1 ? '' : 's'} ` +
    `(${formatNumber(requiredLengthIn, 2)} in of bearing at 1-1/2 in each)`;
  const note =
    addedByPractice > 0
      ? `${needs}; common practice adds ${addedByPractice}: ${byPractice} jack studs under a header spanning over ${TWO_JACKS_OVER_FT} ft, as code header tables lay out longer headers, for a steadier seat and room to nail the header off.`
      : `${needs}.`;
  return { count, forBearing, addedByPractice, note };
}
