import { describe, expect, it } from 'vitest';
import { parseLength } from '@/lib/calc';
import {
  emptyTapeEntry,
  pressBackspace,
  pressDigit,
  tapeText,
  type TapeEntry,
} from '@/lib/ui/member/tape-entry';

const keyed = (steps: (number | 'feet' | 'inches' | 'sixteenths')[]): TapeEntry =>
  steps.reduce<TapeEntry>(
    (entry, step) => (typeof step === 'number' ? pressDigit(entry, step) : { ...entry, part: step }),
    emptyTapeEntry(),
  );

describe('tape keypad entry (common practice: a tape reads feet, inches and sixteenths)', () => {
  it('keys 13 ft 6-6/16 in and writes it reduced, as the length parser reads it', () => {
    const entry = keyed([1, 3, 'inches', 6, 'sixteenths', 6]);
    expect(tapeText(entry)).toBe(`13' 6-3/8"`);
    expect(parseLength(tapeText(entry), 'span', { defaultUnit: 'ft' })).toBe(162.375);
  });

  it('refuses 12 or more inches and 16 or more sixteenths', () => {
    expect(keyed(['inches', 1, 2]).inches).toBe('1');
    expect(keyed(['sixteenths', 1, 6]).sixteenths).toBe('1');
  });

  it('writes nothing until a digit is keyed, and feet alone as whole feet', () => {
    expect(tapeText(emptyTapeEntry())).toBe('');
    expect(tapeText(keyed([8]))).toBe(`8' 0"`);
    expect(tapeText(keyed(['sixteenths', 8]))).toBe(`0' 1/2"`);
  });

  it('backspaces into the part before when the active one is empty', () => {
    const entry = pressBackspace({ ...keyed([1, 3, 'inches']), part: 'inches' });
    expect(entry).toMatchObject({ feet: '1', part: 'feet' });
  });
});
