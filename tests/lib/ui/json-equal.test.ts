import { describe, expect, it } from 'vitest';
import { checkMember } from '@/lib/calc';
import { jsonEqual } from '@/lib/ui/json-equal';
import { memberCheckInputSchema } from '@/shared/schemas/calc/member';

const same = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);

describe('jsonEqual', () => {
  it.each([
    [{ a: 1, b: undefined }, { a: 1 }],
    [
      [1, undefined],
      [1, null],
    ],
    [{ x: -0 }, { x: 0 }],
    [{ x: Infinity }, { x: null }],
    [{ x: [1, { y: 'z' }] }, { x: [1, { y: 'z' }] }],
    [{ f: () => 1, a: 1 }, { a: 1 }],
  ])('agrees with JSON.stringify on equal pairs (%j)', (a, b) => {
    expect(same(a, b)).toBe(true);
    expect(jsonEqual(a, b)).toBe(true);
  });

  it('takes keys in any order (where JSON.stringify would differ by the order alone)', () => {
    expect(jsonEqual({ a: 1, b: { c: 2, d: 3 } }, { b: { d: 3, c: 2 }, a: 1 })).toBe(true);
  });

  it.each([
    [{ a: 1 }, { a: 2 }],
    [{ a: 1 }, { a: 1, b: 2 }],
    [
      [1, 2],
      [1, 2, 3],
    ],
    [{ a: [1] }, { a: { 0: 1 } }],
    [{ a: null }, {}],
    ['1', 1],
  ])('agrees with JSON.stringify on unequal pairs (%j)', (a, b) => {
    expect(same(a, b)).toBe(false);
    expect(jsonEqual(a, b)).toBe(false);
  });

  it('finds an engine result equal to itself after a trip through JSON (as the API answers it)', () => {
    // an invented 12 ft floor beam: the result carries undefined keys that JSON drops
    const input = memberCheckInputSchema.parse({
      kind: 'beam',
      edition: 'ASCE 7-22',
      clearSpanFt: 12,
      sources: [{ kind: 'floor', tributaryFt: 12, deadPsf: 10, livePsf: 40 }],
      materialId: 'lvl-2.0e',
      sizeId: '2-ply-1.75x11.875',
    });
    const result = checkMember(input, { diagrams: true });
    const stored = JSON.parse(JSON.stringify(result));
    expect(jsonEqual(result, stored)).toBe(true);
    expect(jsonEqual(result, { ...stored, pass: !stored.pass })).toBe(false);
  });
});
