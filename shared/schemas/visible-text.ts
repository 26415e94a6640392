import { z } from 'zod';

/**
 * Characters that show nothing on their own: white space, control and format characters (zero-width space,
 * joiners, direction marks, the BOM), lone surrogates, combining marks with nothing to sit on, Unicode's
 * default-ignorable code points (Hangul fillers, variation selectors, tags) and the blank Braille pattern.
 */
const INVISIBLE = /^[\p{White_Space}\p{Cc}\p{Cf}\p{Cs}\p{M}\p{Default_Ignorable_Code_Point}\u2800]*$/u;

/** True when `text` has at least one character a reader would see. */
export function hasVisibleCharacter(text: string): boolean {
  return !INVISIBLE.test(text);
}

/**
 * A name: trimmed, at most `max` characters, and not empty or made only of invisible characters (which
 * would pass a plain "not empty" and show a blank row).
 */
export function visibleTextSchema(emptyMessage: string, max: number) {
  return z
    .string()
    .trim()
    .max(max, { message: `At most ${max} characters` })
    .refine(hasVisibleCharacter, { message: emptyMessage });
}
