import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { checkMember } from '@/lib/calc/checks';
import { listMaterials, listSizes } from '@/lib/calc/materials';
import { memberCheckInputSchema, type MemberCheckInputBody } from '@/shared/schemas/calc/member';

const materials = listMaterials().filter((m) => m.family !== 'sawn' || !/stud|no3/.test(m.id));

const memberArb = fc
  .record({
    materialIndex: fc.nat({ max: materials.length - 1 }),
    sizeSeed: fc.nat(),
    clearSpanFt: fc.double({ min: 2, max: 30, noNaN: true }),
    tributaryFt: fc.double({ min: 0.5, max: 30, noNaN: true }),
    deadPsf: fc.double({ min: 0, max: 40, noNaN: true }),
    livePsf: fc.double({ min: 0, max: 60, noNaN: true }),
    pointLb: fc.double({ min: 0, max: 8000, noNaN: true }),
    pointAt: fc.double({ min: 0, max: 1, noNaN: true }),
    edition: fc.constantFrom('ASCE 7-16' as const, 'ASCE 7-22' as const),
    groundSnowPsf: fc.double({ min: 0, max: 80, noNaN: true }),
  })
  .map((r): MemberCheckInputBody => {
    const material = materials[r.materialIndex];
    const sizes = listSizes(material.id);
    const size = sizes[r.sizeSeed % sizes.length];
    return {
      kind: 'beam',
      edition: r.edition,
      clearSpanFt: r.clearSpanFt,
      roofPitchIn12: 6,
      snow: { groundSnowPsf: r.groundSnowPsf },
      sources: [
        { kind: 'floor', tributaryFt: r.tributaryFt, deadPsf: r.deadPsf, livePsf: r.livePsf },
        { kind: 'roof', tributaryFt: r.tributaryFt, deadPsf: r.deadPsf, roofLivePsf: 20 },
        {
          kind: 'point',
          pointKind: 'post-above',
          atFt: r.pointAt * r.clearSpanFt,
          deadLb: r.pointLb / 3,
          liveLb: r.pointLb,
        },
      ],
      materialId: material.id,
      sizeId: size.id,
    };
  });

const check = (body: MemberCheckInputBody) => checkMember(memberCheckInputSchema.parse(body));

describe('member check properties', () => {
  it('every number in the result is finite for any valid input', () => {
    fc.assert(
      fc.property(memberArb, (body) => {
        const result = check(body);
        for (const c of result.checks) {
          expect(Number.isFinite(c.demand) && Number.isFinite(c.capacity) && Number.isFinite(c.ratio)).toBe(
            true,
          );
          for (const f of c.factors) expect(Number.isFinite(f.value)).toBe(true);
        }
        expect(Number.isFinite(result.bearing.requiredLengthIn)).toBe(true);
      }),
      { numRuns: 150 },
    );
  });

  it('the governing ratio never falls when the span grows or the loads grow', () => {
    fc.assert(
      fc.property(memberArb, fc.double({ min: 1.01, max: 2, noNaN: true }), (body, k) => {
        // span: uniform loads only (a point load fixed in place may sit nearer mid-span on a longer span and
        // lower an end shear — physics, not a defect)
        const uniformOnly = { ...body, sources: body.sources.filter((s) => s.kind !== 'point') };
        const base = check(uniformOnly).governing.ratio;
        const longer = check({ ...uniformOnly, clearSpanFt: Math.min(40, body.clearSpanFt * k) }).governing
          .ratio;
        const loaded = check(body).governing.ratio;
        const heavier = check({
          ...body,
          sources: body.sources.map((s) =>
            s.kind === 'floor' ? { ...s, livePsf: (s.livePsf ?? 0) * k + 1 } : s,
          ),
        }).governing.ratio;
        expect(longer).toBeGreaterThanOrEqual(base * (1 - 1e-9));
        expect(heavier).toBeGreaterThanOrEqual(loaded * (1 - 1e-9));
      }),
      { numRuns: 150 },
    );
  });
});
