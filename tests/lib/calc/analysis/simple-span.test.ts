import { describe, expect, it } from 'vitest';
import { createSimpleSpan } from '@/lib/calc/analysis';
import { CalcInputError } from '@/lib/calc/types';
import { expectApprox } from '@/tests/helpers/approx';

// Units in the closed forms below: l in ft, w in plf, P in lb; E·I in lb·in², so deflections are turned to in
// with 1 ft = 12 in (l³ in ft³ × 1728 in³/ft³).
const EI = 1.6e6 * 47.63; // E 1,600,000 psi × I of a 2x8, 47.63 in⁴ (NDS Supplement Table 1B)
const IN3_PER_FT3 = 1728;
const TIGHT = { rel: 1e-9 };

describe('simple span against AWC Design Aid No. 6 closed forms', () => {
  it('case 1, uniform load: R = wl/2, M = wl²/8 at centre, Δ = 5wl⁴/384EI', () => {
    const w = 400;
    const l = 12;
    const beam = createSimpleSpan({ spanFt: l, eiLbIn2: EI, loads: [{ kind: 'uniform', wPlf: w }] });
    const [left, right] = beam.reactions();
    expectApprox(left.reactionLb, (w * l) / 2, TIGHT); // AWC DA6 case 1: R = wl/2
    expectApprox(right.reactionLb, (w * l) / 2, TIGHT);
    expectApprox(beam.maxShear().value, (w * l) / 2, TIGHT); // AWC DA6 case 1: V = wl/2
    expectApprox(beam.maxMoment().value, (w * l * l) / 8, TIGHT); // AWC DA6 case 1: M max = wl²/8
    expectApprox(beam.maxMoment().atFt, l / 2, TIGHT);
    expectApprox(beam.maxDeflection().value, (5 * w * l ** 4 * IN3_PER_FT3) / (384 * EI), TIGHT); // 5wl⁴/384EI
    expectApprox(beam.maxDeflection().atFt, l / 2, { rel: 1e-9 });
    const x = 3;
    expectApprox(beam.shearLb(x), w * (l / 2 - x), TIGHT); // AWC DA6 case 1: V_x = w(l/2 − x)
    expectApprox(beam.momentLbFt(x), ((w * x) / 2) * (l - x), TIGHT); // M_x = wx(l − x)/2
    expectApprox(
      beam.deflectionIn(x),
      ((w * x) / (24 * EI)) * (l ** 3 - 2 * l * x * x + x ** 3) * IN3_PER_FT3,
      TIGHT,
    ); // Δ_x = wx(l³ − 2lx² + x³)/24EI
  });

  it('case 7, point load at centre: R = P/2, M = Pl/4, Δ = Pl³/48EI', () => {
    const P = 2000;
    const l = 10;
    const beam = createSimpleSpan({
      spanFt: l,
      eiLbIn2: EI,
      loads: [{ kind: 'point', pLb: P, atFt: l / 2 }],
    });
    expectApprox(beam.reactions()[0].reactionLb, P / 2, TIGHT); // AWC DA6 case 7: R = P/2
    expectApprox(beam.maxMoment().value, (P * l) / 4, TIGHT); // M max = Pl/4 at the load
    expectApprox(beam.maxMoment().atFt, l / 2, TIGHT);
    expectApprox(beam.maxDeflection().value, ((P * l ** 3) / (48 * EI)) * IN3_PER_FT3, TIGHT); // Δ max = Pl³/48EI
    const x = 2;
    expectApprox(beam.deflectionIn(x), ((P * x) / (48 * EI)) * (3 * l * l - 4 * x * x) * IN3_PER_FT3, TIGHT); // Δ_x = Px(3l² − 4x²)/48EI
    expectApprox(beam.shearLb(l / 2, 'before'), P / 2, TIGHT);
    expectApprox(beam.shearLb(l / 2, 'after'), -P / 2, TIGHT);
  });

  it('case 8, point load at any point: R1 = Pb/l, M = Pab/l, Δ max at x = √(a(a + 2b)/3)', () => {
    const P = 3000;
    const l = 14;
    const a = 9;
    const b = l - a;
    const beam = createSimpleSpan({ spanFt: l, eiLbIn2: EI, loads: [{ kind: 'point', pLb: P, atFt: a }] });
    const [left, right] = beam.reactions();
    expectApprox(left.reactionLb, (P * b) / l, TIGHT); // AWC DA6 case 8: R1 = Pb/l
    expectApprox(right.reactionLb, (P * a) / l, TIGHT); // R2 = Pa/l
    expectApprox(beam.maxMoment().value, (P * a * b) / l, TIGHT); // M max = Pab/l at the load
    expectApprox(beam.maxMoment().atFt, a, TIGHT);
    const xMax = Math.sqrt((a * (a + 2 * b)) / 3); // AWC DA6 case 8, a > b
    expectApprox(beam.maxDeflection().atFt, xMax, { rel: 1e-9 });
    const deltaMax =
      ((P * a * b * (a + 2 * b) * Math.sqrt(3 * a * (a + 2 * b))) / (27 * EI * l)) * IN3_PER_FT3; // Δ max = Pab(a + 2b)√(3a(a + 2b))/27EIl
    expectApprox(beam.maxDeflection().value, deltaMax, TIGHT);
    expectApprox(beam.deflectionIn(a), ((P * a * a * b * b) / (3 * EI * l)) * IN3_PER_FT3, TIGHT); // Δ at load = Pa²b²/3EIl
  });

  it('case 9, two equal loads symmetrically placed: R = P, M = Pa, Δ = Pa(3l² − 4a²)/24EI', () => {
    const P = 1500;
    const l = 15;
    const a = 4;
    const beam = createSimpleSpan({
      spanFt: l,
      eiLbIn2: EI,
      loads: [
        { kind: 'point', pLb: P, atFt: a },
        { kind: 'point', pLb: P, atFt: l - a },
      ],
    });
    expectApprox(beam.reactions()[0].reactionLb, P, TIGHT); // AWC DA6 case 9: R = P
    expectApprox(beam.maxMoment().value, P * a, TIGHT); // M max = Pa between the loads
    expectApprox(beam.momentLbFt(l / 2), P * a, TIGHT);
    expectApprox(
      beam.maxDeflection().value,
      ((P * a) / (24 * EI)) * (3 * l * l - 4 * a * a) * IN3_PER_FT3,
      TIGHT,
    ); // Δ max = Pa(3l² − 4a²)/24EI
    expectApprox(beam.maxDeflection().atFt, l / 2, { rel: 1e-9 });
  });

  it('case 4, uniform load partially distributed: R1 = wb(2c + b)/2l, M max = R1(a + R1/2w)', () => {
    const w = 600;
    const a = 3;
    const b = 5;
    const c = 4;
    const l = a + b + c;
    const beam = createSimpleSpan({
      spanFt: l,
      eiLbIn2: EI,
      loads: [{ kind: 'uniform', wPlf: w, startFt: a, endFt: a + b }],
    });
    const r1 = ((w * b) / (2 * l)) * (2 * c + b); // AWC DA6 case 4: R1 = wb(2c + b)/2l
    const r2 = ((w * b) / (2 * l)) * (2 * a + b); // R2 = wb(2a + b)/2l
    expectApprox(beam.reactions()[0].reactionLb, r1, TIGHT);
    expectApprox(beam.reactions()[1].reactionLb, r2, TIGHT);
    expectApprox(beam.maxMoment().atFt, a + r1 / w, TIGHT); // at x = a + R1/w
    expectApprox(beam.maxMoment().value, r1 * (a + r1 / (2 * w)), TIGHT); // M max = R1(a + R1/2w)
    expectApprox(beam.momentLbFt(a / 2), (r1 * a) / 2, TIGHT); // M_x = R1·x for x < a
    expectApprox(beam.momentLbFt(l - c / 2), (r2 * c) / 2, TIGHT); // M_x = R2(l − x) for x > a + b
  });

  it('cases 1 + 7 superposed: uniform plus centre point adds reactions, moments and deflections', () => {
    const w = 250;
    const P = 1200;
    const l = 11;
    const beam = createSimpleSpan({
      spanFt: l,
      eiLbIn2: EI,
      loads: [
        { kind: 'uniform', wPlf: w },
        { kind: 'point', pLb: P, atFt: l / 2 },
      ],
    });
    expectApprox(beam.reactions()[0].reactionLb, (w * l) / 2 + P / 2, TIGHT); // DA6 case 1 + case 7
    expectApprox(beam.maxMoment().value, (w * l * l) / 8 + (P * l) / 4, TIGHT); // wl²/8 + Pl/4, both at centre
    const delta = ((5 * w * l ** 4) / (384 * EI) + (P * l ** 3) / (48 * EI)) * IN3_PER_FT3; // 5wl⁴/384EI + Pl³/48EI
    expectApprox(beam.maxDeflection().value, delta, TIGHT);
  });

  it('case 5, uniform load partially distributed at one end: M max = R1²/2w at x = R1/w', () => {
    const w = 500;
    const l = 16;
    const a = 6;
    const beam = createSimpleSpan({
      spanFt: l,
      eiLbIn2: EI,
      loads: [{ kind: 'uniform', wPlf: w, startFt: 0, endFt: a }],
    });
    const r1 = ((w * a) / (2 * l)) * (2 * l - a); // AWC DA6 case 5: R1 = wa(2l − a)/2l
    expectApprox(beam.reactions()[0].reactionLb, r1, TIGHT);
    expectApprox(beam.reactions()[1].reactionLb, (w * a * a) / (2 * l), TIGHT); // R2 = wa²/2l
    expectApprox(beam.maxMoment().value, (r1 * r1) / (2 * w), TIGHT); // M max = R1²/2w
    expectApprox(beam.maxMoment().atFt, r1 / w, TIGHT);
  });
});

describe('simple span input checks', () => {
  it('rejects a load off the span with the field named', () => {
    const build = () =>
      createSimpleSpan({ spanFt: 10, eiLbIn2: EI, loads: [{ kind: 'point', pLb: 100, atFt: 12 }] });
    expect(build).toThrow(CalcInputError);
    expect(build).toThrow(expect.objectContaining({ field: 'loads.0.atFt' }));
  });

  it('rejects a span or stiffness of zero', () => {
    expect(() => createSimpleSpan({ spanFt: 0, eiLbIn2: EI, loads: [] })).toThrow(
      expect.objectContaining({ field: 'spanFt' }),
    );
    expect(() => createSimpleSpan({ spanFt: 10, eiLbIn2: 0, loads: [] })).toThrow(
      expect.objectContaining({ field: 'eiLbIn2' }),
    );
  });

  it('gives zero everywhere for an unloaded span', () => {
    const beam = createSimpleSpan({ spanFt: 10, eiLbIn2: EI, loads: [] });
    expectApprox(beam.maxMoment().value, 0, { abs: 0 });
    expectApprox(beam.maxDeflection().value, 0, { abs: 0 });
    expectApprox(beam.maxShear().value, 0, { abs: 0 });
  });
});
