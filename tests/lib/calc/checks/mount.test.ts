import { describe, expect, it } from 'vitest';
import { checkMember } from '@/lib/calc/checks';
import { prescriptiveVerdict } from '@/lib/calc/prescriptive';
import { buildShortlist } from '@/lib/calc/shortlist';
import { memberCheckInputSchema, prescriptiveInputSchema } from '@/shared/schemas/calc/member';
import { shortlistInputSchema } from '@/shared/schemas/calc/shortlist';
import { expectApprox } from '@/tests/helpers/approx';

/** Invented demo case: a beam raised into the attic over a 12 ft opening, ceiling joists 2x6 at 16 in. */
const raised = {
  kind: 'beam',
  edition: 'ASCE 7-16',
  clearSpanFt: 12,
  roofPitchIn12: 6,
  sources: [
    { kind: 'roof', tributaryFt: 14, deadPsf: 15, roofLivePsf: 20 },
    { kind: 'ceiling', tributaryFt: 12, deadPsf: 10, livePsf: 10 },
  ],
  mount: 'raised',
  joistDepthIn: 5.5,
  atticClearanceIn: 24,
} as const;

describe('a member raised into the attic, the ceiling joists hung from it', () => {
  const result = checkMember(
    memberCheckInputSchema.parse({ ...raised, materialId: 'lvl-2.0e', sizeId: '2-ply-1.75x11.875' }),
  );

  it('asks a hanger or strap per ceiling joist, one per 16 in layout space each side (common practice)', () => {
    // 12 ft = 144 in at 16 in on centre: 9 spaces, 8 joists between the supports on each side.
    expect(result.mount.kind).toBe('raised');
    expect(result.mount.hangers).toBe(16);
    expect(result.mount.requirements[0]).toContain('hanger or strap for each ceiling joist');
  });

  it('states the depth above the ceiling line and above the joists, and whether it clears the attic', () => {
    expectApprox(result.mount.depthAboveCeilingIn ?? NaN, 11.875, { abs: 1e-12 });
    expectApprox(result.mount.depthAboveJoistsIn ?? NaN, 11.875 - 5.5, { abs: 1e-12 });
    expect(result.mount.depthFits).toBe(true);
  });

  it('states the end bearing the bearing check needs, on posts or jacks down to the foundation', () => {
    expectApprox(result.mount.endBearingRequiredIn ?? NaN, result.bearing.requiredLengthIn, { rel: 1e-12 });
    expect(result.mount.requirements.join(' ')).toContain('carried down to the foundation');
    expect(result.mount.requirements.join(' ')).toContain('rafter ties');
  });

  it('fails the fit when the member is deeper than the attic clearance', () => {
    const deep = checkMember(
      memberCheckInputSchema.parse({
        ...raised,
        atticClearanceIn: 10,
        materialId: 'lvl-2.0e',
        sizeId: '2-ply-1.75x11.875',
      }),
    );
    expect(deep.mount.depthFits).toBe(false);
    expect(deep.pass).toBe(false);
  });

  it('keeps the shortlist to sizes that fit the attic clearance', () => {
    const shortlist = buildShortlist(shortlistInputSchema.parse({ ...raised, materialIds: ['lvl-2.0e'] }));
    expect(shortlist.filters).toContain('depth at most 24 in');
    for (const entry of shortlist.passing) expect(entry.dIn).toBeLessThanOrEqual(24);
  });

  it('is outside what header tables cover', () => {
    const verdict = prescriptiveVerdict(
      prescriptiveInputSchema.parse({
        member: { ...raised, kind: 'header', materialId: 'sawn-douglas-fir-larch-no2', sizeId: '2-ply-2x10' },
        buildingWidthFt: 28,
        groundSnowPsf: 0,
      }),
    );
    expect(verdict.verdict).toBe('engineer-needed');
    expect(verdict.reasons.join(' ')).toContain('raised into the attic');
  });
});
