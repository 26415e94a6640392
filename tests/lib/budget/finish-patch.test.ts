import { describe, expect, it } from 'vitest';
import { CEILING_STRIP_FT, DEFAULT_OPENING_HEIGHT_FT, finishPatch } from '@/lib/budget';
import { expectApprox } from '@/tests/helpers/approx';

// Strip widths and the 82-1/2 in rough opening are trade habits (common practice), overridable per budget.
describe('finish patch from the wall and ceiling area disturbed', () => {
  const beam = { clearSpanFt: 12, wallHeightFt: 8, bIn: 3.5, dIn: 11.875 } as const;

  it('opens both ceilings wider for a flush beam than for a dropped one', () => {
    const flush = finishPatch({ ...beam, work: 'wall-removed', mount: 'flush' });
    const dropped = finishPatch({ ...beam, work: 'wall-removed', mount: 'dropped' });
    expect(flush.ceilingSf).toBe(2 * CEILING_STRIP_FT.flush * 12); // 48 sq ft
    expect(dropped.ceilingSf).toBe(2 * CEILING_STRIP_FT.dropped * 12); // 24 sq ft
    expect(flush.wrapSf).toBe(0);
    // A dropped beam is wrapped on both sides and its bottom: (3.5 + 2 × 11.875) in × 12 ft.
    expectApprox(dropped.wrapSf, ((3.5 + 23.75) / 12) * 12, { abs: 1e-9 });
    // The wall ends where it met other walls: 2 ends × 2 faces × 1 ft × 8 ft.
    expect(dropped.wallSf).toBe(32);
    expect(dropped.floorLf).toBe(12);
  });

  it('patches both faces around a new opening, less the opening itself', () => {
    const patch = finishPatch({ ...beam, clearSpanFt: 5, work: 'opening', mount: 'dropped' });
    // 2 faces × ((5 + 2) ft × 8 ft − 5 ft × 6.875 ft) = 2 × (56 − 34.375) = 43.25 sq ft.
    expectApprox(patch.wallSf, 43.25, { abs: 1e-9 });
    expect(patch.ceilingSf).toBe(0);
    expect(patch.floorLf).toBe(5);
    expectApprox(patch.trimLf, 2 * (2 * DEFAULT_OPENING_HEIGHT_FT + 5), { abs: 1e-9 });
  });

  it('takes the estimator’s strip width', () => {
    expect(finishPatch({ ...beam, work: 'wall-removed', mount: 'flush', ceilingStripFt: 3 }).ceilingSf).toBe(
      72,
    );
  });
});
