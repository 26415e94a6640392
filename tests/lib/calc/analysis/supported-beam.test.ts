import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { createSupportedBeam, type SupportedBeamInput } from '@/lib/calc/analysis';
import type { BeamLoad } from '@/lib/calc/types';
import { expectApprox } from '@/tests/helpers/approx';

/** E·I of a 2x10 at 1.6e6 psi (NDS Supplement Table 1B: I 98.93 in⁴), lb·in²; deflection in in = 1728·(ft³ form)/EI. */
const EI = 1.6e6 * 98.93;
const toIn = 1728 / EI;
const beam = (input: Omit<SupportedBeamInput, 'eiLbIn2'>) => createSupportedBeam({ ...input, eiLbIn2: EI });
const reactions = (b: ReturnType<typeof beam>) => b.reactions().map((r) => r.reactionLb);

describe('beam overhanging one support (AWC Design Aid No. 6)', () => {
  // Span l = 12 ft between supports, overhang a = 4 ft past the right support.
  const l = 12;
  const a = 4;

  it('uniform load over the whole length: R1 = w(l² − a²)/2l, R2 = w(l + a)²/2l, M at R2 = wa²/2, M_max = w(l+a)²(l−a)²/8l²', () => {
    const w = 200;
    const b = beam({ lengthFt: l + a, supportsFt: [0, l], loads: [{ kind: 'uniform', wPlf: w }] });
    const [r1, r2] = reactions(b);
    expectApprox(r1, (w * (l * l - a * a)) / (2 * l), { rel: 1e-12 });
    expectApprox(r2, (w * (l + a) ** 2) / (2 * l), { rel: 1e-12 });
    expectApprox(b.momentLbFt(l), (-w * a * a) / 2, { rel: 1e-12 });
    const xMax = (l / 2) * (1 - (a * a) / (l * l));
    expectApprox(b.momentLbFt(xMax), (w * (l + a) ** 2 * (l - a) ** 2) / (8 * l * l), { rel: 1e-12 });
    // V2 = wa just right of R2, V3 = w(l² + a²)/2l just left of it.
    expectApprox(b.shearLb(l, 'after'), w * a, { rel: 1e-12 });
    expectApprox(b.shearLb(l, 'before'), (-w * (l * l + a * a)) / (2 * l), { rel: 1e-12 });
  });

  it('uniform load on the overhang only: R1 = −wa²/2l (uplift), tip Δ = wa³(4l + 3a)/24EI, rise between supports wa²l²/(18√3·EI) at l/√3', () => {
    const w = 150;
    const b = beam({
      lengthFt: l + a,
      supportsFt: [0, l],
      loads: [{ kind: 'uniform', wPlf: w, startFt: l, endFt: l + a }],
    });
    const [r1, r2] = reactions(b);
    expectApprox(r1, (-w * a * a) / (2 * l), { rel: 1e-12 });
    expectApprox(r2, (w * a * (2 * l + a)) / (2 * l), { rel: 1e-12 });
    expectApprox(b.deflectionIn(l + a), ((w * a ** 3 * (4 * l + 3 * a)) / 24) * toIn, { rel: 1e-9 });
    expectApprox(b.deflectionIn(l / Math.sqrt(3)), ((-w * a * a * l * l) / (18 * Math.sqrt(3))) * toIn, {
      rel: 1e-9,
    });
    expectApprox(b.maxDeflection().atFt, l + a, { rel: 1e-12 });
  });

  it('point load at the end of the overhang: R1 = −Pa/l, R2 = P(l + a)/l, M = Pa at R2, tip Δ = Pa²(l + a)/3EI', () => {
    const P = 800;
    const b = beam({ lengthFt: l + a, supportsFt: [0, l], loads: [{ kind: 'point', pLb: P, atFt: l + a }] });
    const [r1, r2] = reactions(b);
    expectApprox(r1, (-P * a) / l, { rel: 1e-12 });
    expectApprox(r2, (P * (l + a)) / l, { rel: 1e-12 });
    expectApprox(b.maxMoment().value, -P * a, { rel: 1e-12 });
    expectApprox(b.maxMoment().atFt, l, { rel: 1e-12 });
    expectApprox(b.deflectionIn(l + a), ((P * a * a * (l + a)) / 3) * toIn, { rel: 1e-9 });
    // Between the supports the beam rises most at l/√3: Pal²/(9√3·EI).
    expectApprox(b.deflectionIn(l / Math.sqrt(3)), ((-P * a * l * l) / (9 * Math.sqrt(3))) * toIn, {
      rel: 1e-9,
    });
  });

  it('the overhang acts as a cantilever from the support (AWC Design Aid No. 6, cantilever, load at the free end): V = P, M = P(a − x), Δ = Pa³/3EI plus the support rotation', () => {
    const P = 800;
    const b = beam({ lengthFt: l + a, supportsFt: [0, l], loads: [{ kind: 'point', pLb: P, atFt: l + a }] });
    for (const x of [0.5, 2, 3.5]) {
      expectApprox(b.shearLb(l + x), P, { rel: 1e-12 });
      expectApprox(b.momentLbFt(l + x), -P * (a - x), { rel: 1e-12 });
    }
    // Slope at the support of the back span under end moment Pa: θ = Pa·l/3EI; the tip adds θ·a to the fixed
    // cantilever's Pa³/3EI.
    const rotationPart = ((P * a * l) / 3) * a;
    expectApprox(b.deflectionIn(l + a) - rotationPart * toIn, ((P * a ** 3) / 3) * toIn, { rel: 1e-9 });
  });
});

describe('beam continuous over two spans (AWC Design Aid No. 6)', () => {
  const l = 10;

  it('two equal spans, uniform load: R1 = R3 = 3wl/8, centre R2 = 10wl/8 = 1.25wl, M at R2 = −wl²/8, +M = 9wl²/128 at 3l/8, Δ = wl⁴/185EI', () => {
    const w = 100;
    const b = beam({ lengthFt: 2 * l, supportsFt: [0, l, 2 * l], loads: [{ kind: 'uniform', wPlf: w }] });
    const [r1, r2, r3] = reactions(b);
    expectApprox(r1, (3 * w * l) / 8, { rel: 1e-12 });
    expectApprox(r2, 1.25 * w * l, { rel: 1e-12 });
    expectApprox(r3, (3 * w * l) / 8, { rel: 1e-12 });
    expectApprox(b.momentLbFt(l), (-w * l * l) / 8, { rel: 1e-12 });
    expectApprox(b.momentLbFt((3 * l) / 8), (9 * w * l * l) / 128, { rel: 1e-12 });
    expectApprox(b.shearLb(l, 'before'), (-5 * w * l) / 8, { rel: 1e-12 });
    // Δmax = wl⁴/185EI at 0.4215l: the published denominator is rounded (0.5 % here).
    expectApprox(b.maxDeflection().value, ((w * l ** 4) / 185) * toIn, { rel: 0.005 });
    expectApprox(Math.min(b.maxDeflection().atFt, 2 * l - b.maxDeflection().atFt), 0.4215 * l, {
      rel: 1e-3,
    });
  });

  it('two equal spans, uniform load on one span: R1 = 7wl/16, R2 = 5wl/8, R3 = −wl/16 (uplift), +M = 49wl²/512 at 7l/16, Δ = wl⁴/109EI', () => {
    const w = 100;
    const b = beam({
      lengthFt: 2 * l,
      supportsFt: [0, l, 2 * l],
      loads: [{ kind: 'uniform', wPlf: w, startFt: 0, endFt: l }],
    });
    const [r1, r2, r3] = reactions(b);
    expectApprox(r1, (7 * w * l) / 16, { rel: 1e-12 });
    expectApprox(r2, (5 * w * l) / 8, { rel: 1e-12 });
    expectApprox(r3, (-w * l) / 16, { rel: 1e-12 });
    expectApprox(b.maxMoment().value, (49 * w * l * l) / 512, { rel: 1e-12 });
    expectApprox(b.maxMoment().atFt, (7 * l) / 16, { rel: 1e-12 });
    expectApprox(b.momentLbFt(l), (-w * l * l) / 16, { rel: 1e-12 });
    // Δmax = wl⁴/109EI at 0.472l (denominator rounded as published).
    expectApprox(b.maxDeflection().value, ((w * l ** 4) / 109) * toIn, { rel: 0.005 });
    expectApprox(b.maxDeflection().atFt, 0.472 * l, { rel: 2e-3 });
  });

  it('two unequal spans, uniform load: M at the centre support = −w(l₁³ + l₂³)/8(l₁ + l₂)', () => {
    const [l1, l2, w] = [8, 14, 120];
    const b = beam({
      lengthFt: l1 + l2,
      supportsFt: [0, l1, l1 + l2],
      loads: [{ kind: 'uniform', wPlf: w }],
    });
    const mc = (-w * (l1 ** 3 + l2 ** 3)) / (8 * (l1 + l2));
    expectApprox(b.momentLbFt(l1), mc, { rel: 1e-12 });
    const [r1, , r3] = reactions(b);
    // AWC Design Aid No. 6, two unequal spans: R1 = M1/l1 + wl1/2, R3 = M1/l2 + wl2/2 (M1 the support moment, negative).
    expectApprox(r1, mc / l1 + (w * l1) / 2, { rel: 1e-12 });
    expectApprox(r3, mc / l2 + (w * l2) / 2, { rel: 1e-12 });
  });
});

/** A member of random geometry (overhangs, two or three supports) with random downward loads. */
const member = fc
  .record({
    left: fc.constantFrom(0, 1.5, 4),
    span1: fc.double({ min: 3, max: 20, noNaN: true }),
    span2: fc.option(fc.double({ min: 3, max: 20, noNaN: true }), { nil: undefined }),
    right: fc.constantFrom(0, 2, 5),
    seeds: fc.array(
      fc.record({
        point: fc.boolean(),
        p: fc.double({ min: 0, max: 5000, noNaN: true }),
        x1: fc.double({ min: 0, max: 1, noNaN: true }),
        x2: fc.double({ min: 0, max: 1, noNaN: true }),
      }),
      { maxLength: 5 },
    ),
  })
  .map(({ left, span1, span2, right, seeds }) => {
    const supportsFt = [left, left + span1];
    if (span2 !== undefined) supportsFt.push(left + span1 + span2);
    const lengthFt = supportsFt[supportsFt.length - 1] + right;
    const loads: BeamLoad[] = seeds.map((s) =>
      s.point
        ? { kind: 'point', pLb: s.p, atFt: s.x1 * lengthFt }
        : {
            kind: 'uniform',
            wPlf: s.p / 10,
            startFt: Math.min(s.x1, s.x2) * lengthFt,
            endFt: Math.max(s.x1, s.x2) * lengthFt,
          },
    );
    return { lengthFt, supportsFt, loads };
  });

describe('supported beam properties (statics, compatibility, symmetry)', () => {
  it('reactions balance the loads in force and moment, the ends are free of moment and the supports do not move', () => {
    fc.assert(
      fc.property(member, ({ lengthFt, supportsFt, loads }) => {
        const b = beam({ lengthFt, supportsFt, loads });
        let total = 0;
        let moment = 0;
        for (const l of loads) {
          const w = l.kind === 'point' ? l.pLb : l.wPlf * ((l.endFt ?? 0) - (l.startFt ?? 0));
          const x = l.kind === 'point' ? l.atFt : 0.5 * ((l.startFt ?? 0) + (l.endFt ?? 0));
          total += w;
          moment += w * x;
        }
        const rs = b.reactions();
        const scale = Math.max(1, total * lengthFt);
        expectApprox(
          rs.reduce((sum, r) => sum + r.reactionLb, 0),
          total,
          { abs: 1e-9 * Math.max(1, total) },
        );
        expectApprox(
          rs.reduce((sum, r) => sum + r.reactionLb * r.atFt, 0),
          moment,
          { abs: 1e-9 * scale },
        );
        expectApprox(b.momentLbFt(lengthFt), 0, { abs: 1e-9 * scale });
        // Supports stay put to rounding: 1e-8 of the largest deflection, or 1e-12 in for next to no load (the
        // solver's own residual is about 1e-15 in, which a 1e-15 floor let through only sometimes).
        const dAbs = Math.max(1e-12, 1e-8 * Math.abs(b.maxDeflection().value));
        for (const s of supportsFt) expectApprox(b.deflectionIn(s), 0, { abs: dAbs });
        expect(Number.isFinite(b.maxMoment().value + b.maxDeflection().value + b.maxShear().value)).toBe(
          true,
        );
      }),
    );
  });

  it('a mirrored member gives mirrored reactions and moments', () => {
    fc.assert(
      fc.property(member, ({ lengthFt, supportsFt, loads }) => {
        const b = beam({ lengthFt, supportsFt, loads });
        const mirrored = beam({
          lengthFt,
          supportsFt: supportsFt.map((s) => lengthFt - s).reverse(),
          loads: loads.map((l): BeamLoad =>
            l.kind === 'point'
              ? { ...l, atFt: lengthFt - l.atFt }
              : { ...l, startFt: lengthFt - (l.endFt ?? 0), endFt: lengthFt - (l.startFt ?? 0) },
          ),
        });
        const scale = Math.max(1, ...reactions(b).map(Math.abs));
        const back = reactions(mirrored).reverse();
        reactions(b).forEach((r, i) => expectApprox(back[i], r, { abs: 1e-9 * scale }));
        for (const t of [0.1, 0.37, 0.5, 0.81]) {
          expectApprox(mirrored.momentLbFt(lengthFt * (1 - t)), b.momentLbFt(lengthFt * t), {
            abs: 1e-9 * scale * lengthFt,
          });
        }
      }),
    );
  });

  it('two equal spans under any uniform load put 1.25·wl on the centre post', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 2, max: 30, noNaN: true }),
        fc.double({ min: 1, max: 3000, noNaN: true }),
        (l, w) => {
          const b = beam({
            lengthFt: 2 * l,
            supportsFt: [0, l, 2 * l],
            loads: [{ kind: 'uniform', wPlf: w }],
          });
          expectApprox(reactions(b)[1], 1.25 * w * l, { rel: 1e-10 });
        },
      ),
    );
  });
});
