import { describe, expect, it } from 'vitest';
import { buildFramingList } from '@/lib/calc';
import { designedHeader } from '@/lib/ui/member/designed-header';
import { framingInputSchema } from '@/shared/schemas/calc/framing';

const lvl = {
  material: 'lvl' as const,
  designation: '2-ply 1-3/4 x 9-1/4 LVL 2.0E',
  plies: 2,
  depthIn: 9.25,
  bearingLeftIn: null,
  bearingRightIn: null,
};

describe("designedHeader: the framing list's header from the engineer's member", () => {
  it('takes the engineer’s depth and plies; engineered lumber is ordered to length', () => {
    expect(designedHeader(lvl)).toEqual({
      header: { label: '2-ply 1-3/4 x 9-1/4 LVL 2.0E (LVL)', depthIn: 9.25, plies: 2, engineered: true },
      jacksPerSide: null,
    });
  });

  it('sets jack studs from the longer bearing: one per 1-1/2 in (common practice)', () => {
    expect(designedHeader({ ...lvl, bearingLeftIn: 3, bearingRightIn: 4.5 })).toMatchObject({
      jacksPerSide: 3,
    });
    expect(designedHeader({ ...lvl, bearingLeftIn: 3.5, bearingRightIn: null })).toMatchObject({
      jacksPerSide: 3,
    });
    expect(designedHeader({ ...lvl, bearingLeftIn: 7 })).toEqual({
      problem: expect.stringMatching(/5 jack studs/),
    });
  });

  it('a W shape is one piece; sawn lumber is cut from stock; no depth or too many plies says why', () => {
    expect(
      designedHeader({ ...lvl, material: 'steel-w', designation: 'W8x18', plies: null, depthIn: 8.14 }),
    ).toMatchObject({ header: { plies: 1, engineered: true } });
    expect(designedHeader({ ...lvl, material: 'sawn', designation: '(2) 2x10' })).toMatchObject({
      header: { engineered: false },
    });
    expect(designedHeader({ ...lvl, depthIn: null })).toEqual({ problem: expect.stringMatching(/no depth/) });
    expect(designedHeader({ ...lvl, plies: 5 })).toEqual({ problem: expect.stringMatching(/5 plies/) });
  });

  it('the framing list rebuilt at the engineer’s member: header pieces and jack length follow it', () => {
    const designed = designedHeader({ ...lvl, depthIn: 11.875, bearingLeftIn: 3, bearingRightIn: 3 });
    if (!('header' in designed)) throw new Error(designed.problem);
    // 38 in RO, 80 in RO height, a 97-1/8 in wall: header = RO + 1-1/2 in per jack each end (common practice).
    const list = buildFramingList(
      framingInputSchema.parse({
        roughOpeningWidthIn: 38,
        roughOpeningHeightIn: 80,
        wallHeightIn: 97.125,
        jacksPerSide: designed.jacksPerSide,
        header: designed.header,
      }),
    );
    expect(list.headerLengthIn).toBe(38 + 2 * 2 * 1.5);
    expect(list.lines[0]).toMatchObject({ item: 'Header 2-ply 1-3/4 x 9-1/4 LVL 2.0E (LVL)', qty: 2 });
    // The preliminary 82-1/2 in opening would put this deeper header into the top plates: the list says so.
    expect(() =>
      buildFramingList(
        framingInputSchema.parse({
          roughOpeningWidthIn: 38,
          roughOpeningHeightIn: 82.5,
          wallHeightIn: 97.125,
          header: designed.header,
        }),
      ),
    ).toThrow(/above the underside of the top plates/);
    expect(list.lines[1]).toMatchObject({ qty: 4, lengthIn: 80 - 1.5 });
  });
});
