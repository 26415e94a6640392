/**
 * RegExp source of an unsigned decimal: "13", "13.5", ".5".
 * @example new RegExp(`^${DECIMAL}$`).test('13.5') // true
 * Reference: input convention (no standard).
 */
export const DECIMAL = String.raw`(?:\d+(?:\.\d*)?|\.\d+)`;
const FRACTION = String.raw`\d+\s*/\s*\d+`;
/**
 * RegExp source of a mixed number: "6 1/2", "6-1/2", a lone fraction "3/4" or a decimal.
 * @example new RegExp(`^${MIXED}$`).test('6-1/2') // true
 * Reference: tape-measure notation (common practice).
 */
export const MIXED = String.raw`(?:${DECIMAL}(?:\s+|\s*-\s*)${FRACTION}|${FRACTION}|${DECIMAL})`;

/** What went wrong reading a number, for the caller's message. */
export type NumberProblem = 'zero-denominator' | 'improper-fraction' | 'not-finite';

/**
 * Value of a mixed-number text matched by MIXED ("6 1/2" → 6.5, "3/4" → 0.75, "13.25" → 13.25).
 * In a mixed number the fraction must be proper ("6 3/2" is refused); a lone fraction may exceed 1.
 *
 * @param text dimensionless number text, already trimmed
 * @returns the value, or the problem that stops it being read
 * @example mixedNumberValue('6-1/2') // 6.5
 * Reference: arithmetic (tape-measure notation, common practice).
 */
export function mixedNumberValue(text: string): number | NumberProblem {
  const match = /^(?:(\d+(?:\.\d*)?|\.\d+)(?:\s+|\s*-\s*))?(?:(\d+)\s*\/\s*(\d+))?$/.exec(text);
  if (!match || (match[2] === undefined && match[1] === undefined)) {
    return finiteOr(Number(text));
  }
  const whole = match[1] === undefined ? 0 : Number(match[1]);
  if (match[2] === undefined) return finiteOr(whole);
  const numerator = Number(match[2]);
  const denominator = Number(match[3]);
  if (denominator === 0) return 'zero-denominator';
  if (match[1] !== undefined && numerator >= denominator) return 'improper-fraction';
  return finiteOr(whole + numerator / denominator);
}

function finiteOr(value: number): number | NumberProblem {
  return Number.isFinite(value) ? value : 'not-finite';
}

/**
 * Text as the parsers see it: trimmed, lower case, typographic quotes and primes turned into ' and ",
 * two single quotes into one double quote, runs of spaces into one, thousands commas dropped ("1,500").
 *
 * @example normalizeEntry(' 13’ 6″ ') // "13' 6\""
 * Reference: input convention (no standard).
 */
export function normalizeEntry(text: string): string {
  return text
    .trim()
    .toLowerCase()
    .replace(/[’‘′`´]/g, "'")
    .replace(/[”“″]/g, '"')
    .replace(/''/g, '"')
    .replace(/(\d),(?=\d{3}(?:\D|$))/g, '$1')
    .replace(/\s+/g, ' ');
}

/**
 * The typed text as quoted in a message: trimmed and cut to 40 characters.
 * @example shown('  13x  ') // "13x"
 * Reference: message convention (no standard).
 */
export function shown(text: string): string {
  const trimmed = text.trim();
  return trimmed.length > 40 ? `${trimmed.slice(0, 40)}…` : trimmed;
}
