import { describe, expect, it } from 'vitest';
import { CalcInputError, checkMember } from '@/lib/calc';
import { memberCheckInputSchema, type MemberCheckInputBody } from '@/shared/schemas/calc/member';
import { expectApprox } from '@/tests/helpers/approx';

/** A floor beam with a partial wall and a post above (test input, not a published case). */
const body: MemberCheckInputBody = {
  kind: 'beam',
  edition: 'ASCE 7-16',
  clearSpanFt: 14,
  bearingLeftIn: 4.5,
  bearingRightIn: 4.5,
  sources: [
    { kind: 'wall-above', wPlf: 48, startFt: 2, endFt: 6.5 },
    { kind: 'point', pointKind: 'post-above', atFt: 9, deadLb: 600, liveLb: 900 },
  ],
  materialId: 'lvl-2.0e',
  sizeId: '2-ply-1.75x11.875',
};

const run = (b: MemberCheckInputBody) => checkMember(memberCheckInputSchema.parse(b));

describe('takedown text in the positions the user entered', () => {
  it('says the post at 9 ft and the wall from 2 to 6.5 ft, measured from the support face', () => {
    const result = run(body);
    const lines = result.takedown.filter((l) => l.label !== 'Self-weight');
    expect(lines.map((l) => l.expression)).toEqual([
      '48 plf (given) from 2 to 6.5 ft',
      '600 lb at 9 ft',
      '900 lb at 9 ft',
    ]);
    // the numbers stay on the analysed member: half the 4-1/2 in bearing on (DESIGN.md §5 design span)
    expectApprox(lines[1].atFt ?? NaN, 9 + 2.25 / 12, { abs: 1e-12 });
  });

  it('measures from the tip of a left overhang, where the analysis starts too', () => {
    const result = run({ ...body, overhangLeftFt: 2 });
    const post = result.takedown.find((l) => l.label === 'Post above');
    expect(post?.expression).toBe('600 lb at 9 ft');
    expectApprox(post?.atFt ?? NaN, 9, { abs: 1e-12 });
  });

  it('says the second span of a continuous member from the left support face as well', () => {
    const result = run({
      ...body,
      secondClearSpanFt: 10,
      sources: [{ kind: 'point', pointKind: 'post-above', atFt: 19.5, deadLb: 600 }],
    });
    expect(result.takedown[0].expression).toBe('600 lb at 19.5 ft');
  });

  it('names a position past the member in entered feet', () => {
    const attempt = () =>
      run({ ...body, sources: [{ kind: 'point', pointKind: 'post-above', atFt: 15, deadLb: 600 }] });
    expect(attempt).toThrow(CalcInputError);
    // 14 ft clear + half of each 4-1/2 in bearing, less the half bearing before the face: 14.19 ft
    expect(attempt).toThrow('Post above position: 15 ft is past the 14.19 ft span');
  });
});
