/**
 * Sizes of the diagrams' text chips. react-native-svg cannot measure text before drawing it, so widths are
 * estimated from per-character advances of the UI face (Inter), rounded up so an estimate is never short.
 */

export const LABEL_FONT_SIZE = 13;
/** Height of a label chip, px. */
export const LABEL_HEIGHT = 18;
/** Space inside a chip on each side of its text, px. */
export const LABEL_PAD_X = 4;

const NARROW = new Set([...'ijlI!|.,:;\'"·`']);
const SLIM = new Set([...'frt()[]/-1 ']);
const WIDE = new Set([...'mwMW@%']);

/** Advance of one character as a fraction of the font size. */
function advanceEm(ch: string): number {
  if (NARROW.has(ch)) return 0.3;
  if (SLIM.has(ch)) return 0.42;
  if (WIDE.has(ch)) return 0.92;
  if (ch >= 'A' && ch <= 'Z') return 0.72;
  return 0.62;
}

/**
 * Estimated width of a line of text, px (an upper estimate for Inter).
 * @example estimateTextWidth('5,381 lb') // about 46 at 13 px
 */
export function estimateTextWidth(text: string, fontSize = LABEL_FONT_SIZE): number {
  let em = 0;
  for (const ch of text) em += advanceEm(ch);
  return Math.ceil(em * fontSize);
}

/** Width of a chip holding `text`, px. */
export function chipWidth(text: string): number {
  return estimateTextWidth(text) + 2 * LABEL_PAD_X;
}

/**
 * Shortens text with an ellipsis so its chip fits `maxWidthPx`; text that fits is returned as is.
 * @example fitText('A very long load label · D 40 plf', 120)
 */
export function fitText(text: string, maxWidthPx: number): string {
  if (chipWidth(text) <= maxWidthPx) return text;
  const chars = [...text];
  while (chars.length > 1 && chipWidth(`${chars.join('').trimEnd()}…`) > maxWidthPx) chars.pop();
  return `${chars.join('').trimEnd()}…`;
}
