/**
 * Sizes of the diagrams' text chips. react-native-svg cannot measure text before drawing it, so widths are
 * estimated from per-character advances of the UI face (Inter), rounded up so an estimate is never short.
 */

export const LABEL_FONT_SIZE = 13;
/** Height of a label chip, px. */
export const LABEL_HEIGHT = 18;
/** Space inside a chip on each side of its text, px. */
export const LABEL_PAD_X = 4;

const NARROW = 'ijlI!|.,:;\'"`·';
const SLIM = 'frt()[]/-1 ';
const WIDE = 'mwMW@%';

/** Advance of each character as a fraction of the font size (other characters: 0.62). */
const ADVANCE_EM = new Map<string, number>();
for (const ch of NARROW) ADVANCE_EM.set(ch, 0.3);
for (const ch of SLIM) ADVANCE_EM.set(ch, 0.42);
for (const ch of WIDE) ADVANCE_EM.set(ch, 0.92);
for (let c = 65; c <= 90; c++) {
  const ch = String.fromCharCode(c);
  if (!ADVANCE_EM.has(ch)) ADVANCE_EM.set(ch, 0.72);
}
const DEFAULT_EM = 0.62;

/** Widths already worked out at the label size; labels repeat on every keystroke. */
const widthCache = new Map<string, number>();
const CACHE_LIMIT = 2000;

/**
 * Estimated width of a line of text, px (an upper estimate for Inter).
 * @example estimateTextWidth('5,381 lb') // about 46 at 13 px
 */
export function estimateTextWidth(text: string, fontSize = LABEL_FONT_SIZE): number {
  const cached = fontSize === LABEL_FONT_SIZE ? widthCache.get(text) : undefined;
  if (cached !== undefined) return cached;
  let em = 0;
  for (const ch of text) em += ADVANCE_EM.get(ch) ?? DEFAULT_EM;
  const width = Math.ceil(em * fontSize);
  if (fontSize === LABEL_FONT_SIZE) {
    if (widthCache.size >= CACHE_LIMIT) widthCache.clear();
    widthCache.set(text, width);
  }
  return width;
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
  const cut = (n: number) => `${chars.slice(0, n).join('').trimEnd()}…`;
  let lo = 1;
  let hi = chars.length - 1;
  while (lo < hi) {
    const mid = Math.ceil((lo + hi) / 2);
    if (chipWidth(cut(mid)) <= maxWidthPx) lo = mid;
    else hi = mid - 1;
  }
  return cut(lo);
}
