import { describe, expect, it } from 'vitest';
import { curveValue, pickCurveValues } from '@/lib/ui/diagrams/curve-picks';
import type { CurveKind } from '@/lib/ui/diagrams/value-text';
import { expectApprox } from '@/tests/helpers/approx';
import { busyBody, check, fixtureBody, headerBody } from './cases';

const KINDS: CurveKind[] = ['shear', 'moment', 'deflection'];

describe('pickCurveValues', () => {
  describe.each([
    ['fixture', fixtureBody],
    ['busy', busyBody],
    ['header', headerBody],
  ])('on the %s beam', (_name, body) => {
    const samples = check(body).diagram?.samples ?? [];

    it.each(KINDS)("labels the %s curve's extremes with the samples' own largest and smallest", (kind) => {
      const values = samples.map((s) => curveValue(s, kind));
      const picks = pickCurveValues(samples, kind);
      const top = Math.max(...values);
      const bottom = Math.min(...values);
      const tol = { rel: 1e-12, abs: 1e-12 };
      if (top > 1e-9 * Math.max(top, -bottom)) {
        const pick = picks.find((p) => p.extreme && p.value > 0);
        expectApprox(pick?.value ?? NaN, top, tol);
      }
      if (bottom < -1e-9 * Math.max(top, -bottom)) {
        const pick = picks.find((p) => p.extreme && p.value < 0);
        expectApprox(pick?.value ?? NaN, bottom, tol);
      }
      expect(picks[0].extreme).toBe(true);
      expectApprox(Math.abs(picks[0].value), Math.max(top, -bottom), tol);
    });

    it.each(KINDS)('labels the %s curve at both supports', (kind) => {
      const picks = pickCurveValues(samples, kind);
      const left = picks.filter((p) => p.role === 'left-support');
      const right = picks.filter((p) => p.role === 'right-support');
      expect(left).toHaveLength(1);
      expect(right).toHaveLength(1);
      expectApprox(left[0].value, curveValue(samples[0], kind), { abs: 1e-9 });
      expectApprox(right[0].value, curveValue(samples[samples.length - 1], kind), { abs: 1e-9 });
    });
  });

  it('matches the closed forms of a simple span under uniform load (AWC Design Aid No. 6, Figure 1; figure number from memory)', () => {
    const result = check(headerBody);
    // governing combination D + Lr: every D and Lr line of the takedown at factor 1, over the design span
    expect(result.diagram?.combination).toBe('D + Lr');
    const wPlf = result.takedown
      .filter((l) => l.type === 'D' || l.type === 'Lr')
      .reduce((s, l) => s + (l.wPlf ?? 0), 0);
    const L = result.spans.designSpanFt;
    const samples = result.diagram?.samples ?? [];
    const moment = pickCurveValues(samples, 'moment');
    expect(moment[0].role).toBe('max');
    expectApprox(moment[0].value, (wPlf * L * L) / 8, { rel: 1e-9 }); // M max = wl²/8
    expectApprox(moment[0].xFt, L / 2, { abs: 1e-9 }); // at the centre
    const shear = pickCurveValues(samples, 'shear');
    const left = shear.find((p) => p.role === 'left-support');
    const right = shear.find((p) => p.role === 'right-support');
    expectApprox(left?.value ?? NaN, (wPlf * L) / 2, { rel: 1e-9 }); // R = V = wl/2
    expectApprox(right?.value ?? NaN, (-wPlf * L) / 2, { rel: 1e-9 });
    expect(shear.some((p) => p.role === 'max' || p.role === 'min')).toBe(false); // the extremes are the supports
    const moments = pickCurveValues(samples, 'moment').filter((p) => p.role !== 'max');
    expect(moments.map((p) => p.value)).toEqual([0, 0]); // no moment at a simple support
  });

  it('labels a shear reached at a support and along the span once, at the support (point loads only)', () => {
    // with point loads and no self-weight the shear is constant between loads (AWC Design Aid No. 6, simple beam,
    // concentrated load at any point)
    const samples =
      check({ ...fixtureBody, selfWeight: false, sources: [fixtureBody.sources[2]] }).diagram?.samples ?? [];
    const picks = pickCurveValues(samples, 'shear');
    expect(picks.map((p) => p.role).sort()).toEqual(['left-support', 'right-support']);
    expect(picks.every((p) => p.extreme)).toBe(true);
  });
});
