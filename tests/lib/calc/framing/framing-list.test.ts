import { describe, expect, it } from 'vitest';
import { buildFramingList, pickStock, type FramingList } from '@/lib/calc/framing';
import { CalcInputError } from '@/lib/calc/types';
import { framingInputSchema } from '@/shared/schemas/calc/framing';
import { expectApprox } from '@/tests/helpers/approx';

const door = {
  roughOpeningWidthIn: 38,
  roughOpeningHeightIn: 82.5,
  wallHeightIn: 97.125, // 8 ft wall: 92-5/8 precut + bottom plate + double top plate (common practice)
  header: { label: '2x8', depthIn: 7.25, plies: 2 }, // 2x8 dressed depth 7-1/4 in (NDS Supplement Table 1B)
};

const build = (input: Record<string, unknown>) => buildFramingList(framingInputSchema.parse(input));

const line = (list: FramingList, prefix: string) => {
  const found = list.lines.find((l) => l.item.startsWith(prefix));
  if (!found) throw new Error(`no line ${prefix}`);
  return found;
};

describe('buildFramingList', () => {
  it('header = RO width + 1-1/2 in per jack at each end (common practice)', () => {
    const list = build(door);
    expectApprox(list.headerLengthIn, 38 + 2 * 1.5, { abs: 1e-9 });
    expect(line(list, 'Header').qty).toBe(2);
    expectApprox(build({ ...door, jacksPerSide: 2 }).headerLengthIn, 38 + 4 * 1.5, { abs: 1e-9 });
  });

  it('jack = RO height − bottom plate thickness (common practice)', () => {
    const jack = line(build(door), 'Jack');
    expectApprox(jack.lengthIn, 82.5 - 1.5, { abs: 1e-9 });
    expect(jack.qty).toBe(2);
    expect(jack.stock.label).toBe('92-5/8 in precut stud');
  });

  it('king = plate height − plates: 92-5/8 in for an 8 ft wall, 104-5/8 in for 9 ft (precut studs, common practice)', () => {
    const eightFoot = line(build(door), 'King');
    expectApprox(eightFoot.lengthIn, 92.625, { abs: 1e-9 });
    expect(eightFoot.stock).toEqual({ label: '92-5/8 in precut stud', lengthIn: 92.625, count: 2 });
    const nineFoot = line(build({ ...door, wallHeightIn: 109.125 }), 'King');
    expectApprox(nineFoot.lengthIn, 104.625, { abs: 1e-9 });
    expect(nineFoot.stock.label).toBe('104-5/8 in precut stud');
  });

  it('cripples above fill to the top plates at the 16 in layout (common practice)', () => {
    const cripples = line(build(door), 'Cripples above');
    // 97-1/8 − 3 (two top plates) − (82-1/2 + 7-1/4) = 4-3/8 in
    expectApprox(cripples.lengthIn, 4.375, { abs: 1e-9 });
    // 41 in header at 16 in o.c.: positions 0, 16, 32 → 3 whatever the layout start
    expect(cripples.qty).toBe(3);
    expect(cripples.stock.count).toBe(1);
  });

  it('puts a window sill and cripples under it', () => {
    const list = build({ ...door, roughOpeningHeightIn: 48, sillHeightIn: 34.5 });
    expectApprox(line(list, 'Jack').lengthIn, 34.5 + 48 - 1.5, { abs: 1e-9 });
    const below = line(list, 'Cripples below');
    expectApprox(below.lengthIn, 34.5 - 1.5 - 1.5, { abs: 1e-9 });
    expect(below.qty).toBe(3);
    expect(line(list, 'Rough sill').qty).toBe(1);
  });

  it('lists plates over the framed width with stock lengths (8 to 20 ft, common practice)', () => {
    const top = line(build(door), 'Top plates');
    expectApprox(top.lengthIn, 41 + 3, { abs: 1e-9 });
    expect(top.qty).toBe(2);
    expect(top.stock).toEqual({ label: '8 ft', lengthIn: 96, count: 1 });
  });

  it('lists cripples at layout above a flat 2x4 header too, noting the code does not require them', () => {
    const list = build({
      ...door,
      jacksPerSide: 0,
      header: { label: '2x4 flat', depthIn: 1.5, plies: 1, flat: true },
    });
    // Common practice: cripples at the 16 in layout over the 38 in header give nailing for the wall finish;
    // IRC 2021 R602.7.4 requires none above a flat 2x4 header. Gap: 97-1/8 wall − 3 (top plates) − the
    // header top at 82-1/2 (RO) + 1-1/2 (flat 2x4) above the subfloor.
    const cripples = line(list, 'Cripples above');
    expect(cripples.qty).toBe(3);
    expectApprox(cripples.lengthIn, 97.125 - 3 - (82.5 + 1.5), { abs: 1 / 32 });
    expect(cripples.note).toContain('not required by code');
    expectApprox(list.headerLengthIn, 38, { abs: 1e-9 });
    expect(list.notes[0]).toContain('R602.7.4');
  });

  it('refuses a header that does not fit under the plates, naming the field', () => {
    try {
      build({ ...door, header: { label: '2x12', depthIn: 11.25, plies: 2 }, roughOpeningHeightIn: 84 });
      expect.fail('expected a CalcInputError');
    } catch (error) {
      expect(error).toBeInstanceOf(CalcInputError);
      expect((error as CalcInputError).field).toBe('header.depthIn');
    }
  });

  it('asks for blocking when the gap above the header is too small for cripples', () => {
    const list = build({ ...door, header: { label: '2x10', depthIn: 9.25, plies: 2 } });
    expect(list.lines.some((l) => l.item.startsWith('Cripples above'))).toBe(false);
    expect(list.warnings[0]).toContain('blocking');
  });
});

describe('pickStock', () => {
  it('cuts several short pieces from one stock length with a 1/8 in kerf (common practice)', () => {
    // two 46-1/4 in pieces need 92-5/8 in with one kerf: 46.25 × 2 + 0.125 = 92.625
    expect(pickStock(46.25, 4, { precut: true, engineered: false }).count).toBe(2);
    expect(pickStock(46.3, 4, { precut: true, engineered: false }).count).toBe(4);
  });

  it('orders engineered lumber and pieces over 20 ft to length', () => {
    expect(pickStock(150, 3, { precut: false, engineered: true })).toEqual({
      label: 'order to length (13 ft)',
      lengthIn: 156,
      count: 3,
    });
    expect(pickStock(250, 1, { precut: false, engineered: false }).label).toBe('order to length (21 ft)');
  });
});
