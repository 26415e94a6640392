import { describe, expect, it } from 'vitest';
import { hasVisibleCharacter, visibleTextSchema } from '@/shared/schemas/visible-text';

/** Each is a character that shows nothing on its own (Unicode character database properties). */
const INVISIBLE: [name: string, text: string][] = [
  ['zero-width space U+200B', '\u200b'],
  ['zero-width non-joiner and joiner U+200C U+200D', '\u200c\u200d'],
  ['word joiner U+2060', '\u2060'],
  ['byte order mark U+FEFF', '\ufeff'],
  ['left-to-right and right-to-left marks', '\u200e\u200f'],
  ['soft hyphen U+00AD', '\u00ad'],
  ['Hangul filler U+3164', '\u3164'],
  ['halfwidth Hangul filler U+FFA0', '\uffa0'],
  ['Hangul choseong and jungseong fillers', '\u115f\u1160'],
  ['blank Braille pattern U+2800', '\u2800'],
  ['Mongolian vowel separator U+180E', '\u180e'],
  ['combining acute accent alone U+0301', '\u0301'],
  ['variation selector U+FE0F', '\ufe0f'],
  ['tag characters', '\u{e0041}\u{e0042}'],
  ['ideographic and no-break spaces', '\u3000\u00a0'],
  ['line and paragraph separators', '\u2028\u2029'],
  ['a lone surrogate', '\ud800'],
  ['a mix of them', ' \u200b\u3164\u2800\ufeff '],
];

describe('hasVisibleCharacter', () => {
  it.each(INVISIBLE)('%s: nothing visible', (_name, text) => {
    expect(hasVisibleCharacter(text)).toBe(false);
  });

  it.each([
    ['a plain name', 'Kestrel Bend'],
    ['one letter', 'x'],
    ['an accented letter', 'e\u0301'],
    ['a name with a zero-width space inside', 'Ro\u200bbin'],
    ['Chinese', '\u5efa\u7b51'],
    ['an emoji', '\u{1f3e0}'],
    ['a digit', '7'],
  ])('%s: visible', (_name, text) => {
    expect(hasVisibleCharacter(text)).toBe(true);
  });
});

describe('visibleTextSchema', () => {
  const schema = visibleTextSchema('Enter a name', 10);

  it('trims, and refuses empty, blank or invisible-only text with one message', () => {
    expect(schema.parse('  Ada  ')).toBe('Ada');
    for (const text of ['', '   ', '\u200b\u200b', '\u3164']) {
      const result = schema.safeParse(text);
      expect(result.success).toBe(false);
      expect(result.error?.issues.map((issue) => issue.message)).toEqual(['Enter a name']);
    }
  });

  it('refuses more than `max` characters', () => {
    expect(schema.safeParse('x'.repeat(11)).error?.issues[0].message).toBe('At most 10 characters');
  });
});
