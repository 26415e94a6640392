import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { endShearsAtD } from '@/lib/calc/checks';
import type { BeamLoad } from '@/lib/calc/types';
import { expectApprox } from '@/tests/helpers/approx';

describe('design shear V with loads near the supports (NDS 2018 §3.4.3.1)', () => {
  it('uniform load: V = w(l/2 − d), the shear at d (AWC Design Aid No. 6 case 1, V_x = w(l/2 − x))', () => {
    const [left, right] = endShearsAtD(12, [{ kind: 'uniform', wPlf: 100 }], 0.5);
    expectApprox(left, 100 * (12 / 2 - 0.5), { rel: 1e-12 });
    expectApprox(right, 100 * (12 / 2 - 0.5), { rel: 1e-12 });
  });

  it('a point load within d is multiplied by x/d and still adds to the near support (NDS 3.4.3.1(b))', () => {
    // Hand calculation: l = 12 ft, d = 1 ft, P = 1,200 lb at x = 0.5 ft. Reduced P' = P·x/d = 600 lb
    // (NDS 3.4.3.1(b), from memory). V_left = P'(l − x)/l = 600 × 11.5/12 = 575 lb; V_right = P'x/l = 25 lb
    // (AWC Design Aid No. 6 case 8, R1 = Pb/l, R2 = Pa/l).
    const [left, right] = endShearsAtD(12, [{ kind: 'point', pLb: 1200, atFt: 0.5 }], 1);
    expectApprox(left, 575, { rel: 1e-12 });
    expectApprox(right, 25, { rel: 1e-12 });
  });

  it('a point load at d or beyond counts in full (AWC Design Aid No. 6 case 8: R1 = Pb/l)', () => {
    const [left] = endShearsAtD(12, [{ kind: 'point', pLb: 1200, atFt: 3 }], 1);
    expectApprox(left, (1200 * 9) / 12, { rel: 1e-12 });
  });

  it('adding a downward load anywhere never lowers either design shear (property)', () => {
    const spanFt = 12;
    const load = fc.oneof(
      fc.record({
        kind: fc.constant('point' as const),
        pLb: fc.double({ min: 0, max: 5000, noNaN: true }),
        atFt: fc.double({ min: 0, max: spanFt, noNaN: true }),
      }),
      fc.record({
        kind: fc.constant('uniform' as const),
        wPlf: fc.double({ min: 0, max: 1000, noNaN: true }),
      }),
    );
    fc.assert(
      fc.property(
        fc.array(load, { maxLength: 4 }),
        load,
        fc.double({ min: 0, max: 2, noNaN: true }),
        (loads: BeamLoad[], extra: BeamLoad, dFt) => {
          const before = endShearsAtD(spanFt, loads, dFt);
          const after = endShearsAtD(spanFt, [...loads, extra], dFt);
          expect(after[0]).toBeGreaterThanOrEqual(before[0] - 1e-9);
          expect(after[1]).toBeGreaterThanOrEqual(before[1] - 1e-9);
        },
      ),
      { numRuns: 200 },
    );
  });
});
