import { describe, expect, it } from 'vitest';
import { checkMember } from '@/lib/calc/checks';
import { memberCheckInputSchema, type MemberCheckInputBody } from '@/shared/schemas/calc/member';
import { expectApprox } from '@/tests/helpers/approx';

// Design span 12 ft (11.75 ft clear + half of 3 in bearing at each end), floor 10 ft tributary at 10 psf dead
// and 40 psf live: w_D = 100 plf, w_L = 400 plf, no self-weight. D + L reaction R = wl/2 = 500 × 12 / 2 =
// 3,000 lb (AWC Design Aid No. 6 case 1).
const beam = (posts: MemberCheckInputBody['posts']) =>
  checkMember(
    memberCheckInputSchema.parse({
      kind: 'beam',
      edition: 'ASCE 7-16',
      clearSpanFt: 11.75,
      sources: [{ kind: 'floor', tributaryFt: 10, deadPsf: 10, livePsf: 40 }],
      selfWeight: false,
      materialId: 'lvl-2.0e',
      sizeId: '2-ply-1.75x11.875',
      supportKind: 'post',
      posts,
    }),
  );

describe('posts and footing pads under a beam', () => {
  it('each post carries the end reaction; the pad is sized at 1,500 psf with its own weight', () => {
    const result = beam({ materialId: 'sawn-douglas-fir-larch-no1', sizeId: '6x6', heightFt: 7.5 });
    const left = result.posts?.[0];
    expectApprox(left?.loadLb ?? NaN, 3000, { rel: 1e-12 }); // R = wl/2 (AWC Design Aid No. 6 case 1)
    expect(left?.soilBearingPsf).toBe(1500); // IRC 2021 R401.4.1 presumptive value
    // 12 in pad at 150 pcf (common practice) weighs 150 psf: A = 3,000 / (1,500 − 150) = 2.22 ft²,
    // side √(2.22 × 144) = 17.9 in, rounded up to the next 2 in: 18 in.
    expect(left?.footingSideIn).toBe(18);
    expect(left?.pass).toBe(true);
  });

  it('a failing post fails the result as a whole and says so', () => {
    // A single 2x4 8 ft tall, unbraced across its 1-1/2 in face: l_e/d = 96 / 1.5 = 64 > 50 (NDS 2018 §3.7.1.4).
    const result = beam({ materialId: 'sawn-spruce-pine-fir-no1-no2', sizeId: '2x4', heightFt: 8 });
    expect(result.checks.every((c) => c.pass)).toBe(true);
    expect(result.posts?.every((p) => !p.pass)).toBe(true);
    expect(result.pass).toBe(false);
    expect(result.warnings.some((w) => w.includes('post'))).toBe(true);
  });
});
