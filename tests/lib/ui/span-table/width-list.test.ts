import { describe, expect, it } from 'vitest';
import { parseWidthList } from '@/lib/ui/span-table/width-list';
import { expectApprox } from '@/tests/helpers/approx';

// Tape notation for lengths (common practice): bare numbers are feet in this field, 6-6 is 6 ft 6 in.
describe('parseWidthList', () => {
  it('reads a comma list of feet in the order typed', () => {
    expect(parseWidthList('4, 8, 12, 16')).toEqual({
      pieces: ['4', '8', '12', '16'],
      widthsFt: [4, 8, 12, 16],
      errors: [],
    });
  });

  it('reads ft-in entries, semicolons and line breaks, and skips empty pieces', () => {
    const list = parseWidthList(`6' 6", 13-4; 162 in\n 2 1/2 ,,`);
    expect(list.errors).toEqual([]);
    expect(list.pieces).toEqual([`6' 6"`, '13-4', '162 in', '2 1/2']);
    const expected = [6.5, 13 + 4 / 12, 13.5, 2.5];
    list.widthsFt.forEach((ft, i) => expectApprox(ft, expected[i], { abs: 1e-12 }));
  });

  it('keeps spaces inside a piece: 13 6 is 13 ft 6 in, as a tape reads', () => {
    expectApprox(parseWidthList('13 6').widthsFt[0], 13.5, { abs: 1e-12 });
  });

  it('names each piece it cannot read, by its place in the list', () => {
    const list = parseWidthList('4, abc, -8');
    expect(list.widthsFt).toEqual([4]);
    expect(list.errors).toHaveLength(2);
    expect(list.errors[0]).toMatch(/^Width 2: can't read "abc"/);
    expect(list.errors[1]).toMatch(/^Width 3: a length can't be negative/);
  });

  it('suggests commas when widths were separated by spaces', () => {
    const [message] = parseWidthList('4 8 12 16').errors;
    expect(message).toMatch(/Separate widths with commas$/);
  });

  it('gives an empty list for empty text (the schema asks for at least one)', () => {
    expect(parseWidthList('  , ')).toEqual({ pieces: [], widthsFt: [], errors: [] });
  });
});
