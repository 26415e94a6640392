import { describe, expect, it } from 'vitest';
import { curveValue } from '@/lib/ui/diagrams/curve-picks';
import { layoutCurve } from '@/lib/ui/diagrams/curve-layout';
import { spanScale } from '@/lib/ui/diagrams/span-frame';
import { formatCurveValue, type CurveKind } from '@/lib/ui/diagrams/value-text';
import { expectApprox } from '@/tests/helpers/approx';
import { busyBody, check, expectClearBoxes, fixtureBody, headerBody, WIDTHS } from './cases';

const KINDS: CurveKind[] = ['shear', 'moment', 'deflection'];
const CASES = [
  ['fixture', fixtureBody],
  ['busy', busyBody],
  ['header', headerBody],
] as const;

describe.each(CASES)('curve layout of the %s beam', (_name, body) => {
  const result = check(body);
  const samples = result.diagram?.samples ?? [];

  describe.each(WIDTHS)('at %i px', (width) => {
    it.each(KINDS)('%s: labels inside the drawing, none overlapping another', (kind) => {
      const layout = layoutCurve(result, kind, width);
      expect(layout).not.toBeNull();
      expectClearBoxes(layout?.labels ?? [], width, layout?.height ?? 0);
    });

    it.each(KINDS)("%s: the largest value is labelled, with the samples' value, at its station", (kind) => {
      const layout = layoutCurve(result, kind, width);
      const values = samples.map((s) => curveValue(s, kind));
      const biggest = values.reduce((a, b) => (Math.abs(b) > Math.abs(a) ? b : a), 0);
      const label = layout?.labels.find((l) => l.strong && l.text === formatCurveValue(kind, biggest));
      expect(label, `no label ${formatCurveValue(kind, biggest)}`).toBeDefined();
      const at = samples.find((s) => curveValue(s, kind) === biggest);
      expectApprox(label?.anchorX ?? NaN, spanScale(result, width).px(at?.xFt ?? NaN), { abs: 1e-9 });
    });

    it('shear: both support values are labelled', () => {
      const texts = layoutCurve(result, 'shear', width)?.labels.map((l) => l.text);
      expect(texts).toContain(formatCurveValue('shear', samples[0].shearLb));
      expect(texts).toContain(formatCurveValue('shear', samples[samples.length - 1].shearLb));
    });
  });

  it('draws shear and moment up and deflection down from the zero line', () => {
    for (const kind of KINDS) {
      const layout = layoutCurve(result, kind, 390);
      const max = layout?.labels.find((l) => l.strong && !l.text.startsWith('-'));
      expect(max, `${kind}: no positive extreme labelled`).toBeDefined();
      if (kind === 'deflection') expect(max?.anchorY).toBeGreaterThan(layout?.baselineY ?? Infinity);
      else expect(max?.anchorY).toBeLessThan(layout?.baselineY ?? -Infinity);
    }
  });

  it('starts and ends the curve at the bearing centres, on the scale the load diagram uses', () => {
    const layout = layoutCurve(result, 'moment', 390);
    const scale = spanScale(result, 390);
    expectApprox(layout?.supportXs[0] ?? NaN, scale.leftCentrePx, { abs: 1e-9 });
    expectApprox(layout?.supportXs[1] ?? NaN, scale.rightCentrePx, { abs: 1e-9 });
    expect(layout?.linePath.startsWith(`M${Math.round(scale.leftCentrePx * 10) / 10} `)).toBe(true);
  });
});

describe('curve layout without samples', () => {
  it('is null when the check ran without diagrams', () => {
    const { diagram: _omitted, ...plain } = check(headerBody);
    expect(layoutCurve(plain, 'shear', 390)).toBeNull();
  });
});
