import { CalcInputError, parseLength } from '@/lib/calc';

/** The widths typed in the list: each piece as typed, its value in ft where it reads, and a message per piece that doesn't. */
export type WidthList = { pieces: string[]; widthsFt: number[]; errors: string[] };

/** Pieces are separated by commas, semicolons or line breaks; spaces stay inside a piece (13 6 is 13 ft 6 in). */
const SEPARATOR = /[,;\n]/;

/**
 * Reads a list of tributary widths as typed ("4, 8, 12, 16", "6' 6\", 13-4"): each piece is a length read by
 * parseLength with bare numbers in feet; empty pieces (a trailing comma) are skipped. Range limits are the
 * shared schema's to check.
 *
 * @param text the list as typed
 * @returns widths in ft, in the order typed, and a message naming each piece that can't be read
 * @example parseWidthList("4, 6' 6\"").widthsFt // [4, 6.5]
 */
export function parseWidthList(text: string): WidthList {
  const pieces = text
    .split(SEPARATOR)
    .map((piece) => piece.trim())
    .filter((piece) => piece !== '');
  const widthsFt: number[] = [];
  const errors: string[] = [];
  pieces.forEach((piece, i) => {
    try {
      widthsFt.push(
        parseLength(piece, 'tributaryWidthsFt', { defaultUnit: 'ft', label: `Width ${i + 1}` }) / 12,
      );
    } catch (error) {
      if (!(error instanceof CalcInputError)) throw error;
      errors.push(
        /\d\s+\d+\s+\d/.test(piece) ? `${error.message}. Separate widths with commas` : error.message,
      );
    }
  });
  return { pieces, widthsFt, errors };
}
