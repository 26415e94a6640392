/** A length keyed in as a tape reads it: whole feet, whole inches, sixteenths; which part the keys go to. */
export type TapeEntry = { feet: string; inches: string; sixteenths: string; part: TapePart };
export type TapePart = 'feet' | 'inches' | 'sixteenths';

export const emptyTapeEntry = (): TapeEntry => ({ feet: '', inches: '', sixteenths: '', part: 'feet' });

const MAX_DIGITS: Record<TapePart, number> = { feet: 2, inches: 2, sixteenths: 2 };

function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}

/** Adds a digit to the active part; a part that would leave its range (12 in, 16 sixteenths) is refused. */
export function pressDigit(entry: TapeEntry, digit: number): TapeEntry {
  const current = entry[entry.part];
  if (current.length >= MAX_DIGITS[entry.part]) return entry;
  const next = current === '0' ? String(digit) : `${current}${digit}`;
  if (entry.part === 'inches' && Number(next) >= 12) return entry;
  if (entry.part === 'sixteenths' && Number(next) >= 16) return entry;
  return { ...entry, [entry.part]: next };
}

/** Removes the last digit of the active part, or of the part before it when the active part is empty. */
export function pressBackspace(entry: TapeEntry): TapeEntry {
  const order: TapePart[] = ['feet', 'inches', 'sixteenths'];
  let index = order.indexOf(entry.part);
  while (index > 0 && entry[order[index]] === '') index -= 1;
  const part = order[index];
  return { ...entry, part, [part]: entry[part].slice(0, -1) };
}

/**
 * The entry as length text the length parser reads: feet, inches and a reduced sixteenth fraction,
 * e.g. { 13, 6, 6 } → `13' 6-3/8"`; empty parts are left out; nothing keyed → ''.
 *
 * @example tapeText({ feet: '13', inches: '6', sixteenths: '6', part: 'feet' }) // `13' 6-3/8"`
 * Reference: tape-measure notation to 1/16 in (common practice).
 */
export function tapeText(entry: TapeEntry): string {
  const feet = entry.feet === '' ? 0 : Number(entry.feet);
  const inches = entry.inches === '' ? 0 : Number(entry.inches);
  const sixteenths = entry.sixteenths === '' ? 0 : Number(entry.sixteenths);
  if (entry.feet === '' && entry.inches === '' && entry.sixteenths === '') return '';
  const divisor = sixteenths === 0 ? 1 : gcd(sixteenths, 16);
  const fraction = sixteenths === 0 ? '' : `${sixteenths / divisor}/${16 / divisor}`;
  const inchText = fraction ? (inches === 0 ? fraction : `${inches}-${fraction}`) : String(inches);
  return `${feet}' ${inchText}"`;
}
