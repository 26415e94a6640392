import { describe, expect, it } from 'vitest';
import { curveValue, pickCurveValues } from '@/lib/ui/diagrams/curve-picks';
import { layoutCurve } from '@/lib/ui/diagrams/curve-layout';
import { curveText, loadDiagramText } from '@/lib/ui/diagrams/diagram-text';
import { layoutLoads } from '@/lib/ui/diagrams/load-layout';
import { memberFrame, spanScale, toEnteredFt } from '@/lib/ui/diagrams/span-frame';
import type { CurveKind } from '@/lib/ui/diagrams/value-text';
import { expectApprox } from '@/tests/helpers/approx';
import { check, expectClearBoxes, overhangBody, twoSpanBody, WIDTHS } from './cases';

const KINDS: CurveKind[] = ['shear', 'moment', 'deflection'];
const tol = { abs: 1e-9 };

/** The x of the first and the last point of an SVG path "Mx yLx y…". */
function pathEnds(path: string): [number, number] {
  const xs = path
    .slice(1)
    .split('L')
    .map((p) => Number(p.split(' ')[0]));
  return [xs[0], xs[xs.length - 1]];
}

describe('two spans continuous over a centre post', () => {
  const result = check(twoSpanBody);
  const frame = memberFrame(result);

  it("takes the engine's three supports and its whole analysed length", () => {
    expect(frame.supports.map((s) => s.name)).toEqual(['left', 'centre', 'right']);
    const engine = result.reactions.bySupport ?? [];
    frame.supports.forEach((s, i) => expectApprox(s.atFt, engine[i].atFt, tol));
    expect(frame.supports.map((s) => s.bearingIn)).toEqual([3, 3.5, 4.5]);
    expectApprox(frame.analysedLengthFt, result.spans.memberLengthFt ?? NaN, tol);
    const samples = result.diagram?.samples ?? [];
    expectApprox(samples[samples.length - 1].xFt, frame.analysedLengthFt, tol);
  });

  it.each(WIDTHS)(
    'scales both spans into the drawing at %i px (DESIGN.md §5: spans and length to buy)',
    (w) => {
      const scale = spanScale(result, w);
      const [left, centre, right] = scale.supports;
      expectApprox(scale.pxPerFt * result.spans.lengthToBuyFt, scale.memberRightPx - scale.memberLeftPx, tol);
      // clear spans between support faces, design spans between bearing centres
      expectApprox(centre.leftFacePx - left.rightFacePx, 12 * scale.pxPerFt, tol);
      expectApprox(right.leftFacePx - centre.rightFacePx, 9 * scale.pxPerFt, tol);
      expectApprox(centre.centrePx - left.centrePx, result.spans.designSpanFt * scale.pxPerFt, tol);
      expectApprox(
        right.centrePx - centre.centrePx,
        (result.spans.secondDesignSpanFt ?? NaN) * scale.pxPerFt,
        tol,
      );
      // the piece ends at the outer faces of the end bearings
      expectApprox(left.leftFacePx, scale.memberLeftPx, tol);
      expectApprox(right.rightFacePx, scale.memberRightPx, tol);
    },
  );

  it.each(WIDTHS)(
    'load diagram at %i px: three bearings, a reaction at each, both spans dimensioned',
    (w) => {
      const layout = layoutLoads(result, w);
      const scale = spanScale(result, w);
      expect(layout.bearings).toHaveLength(3);
      expectClearBoxes([...layout.labels, ...layout.dimensions.map((d) => d.label)], w, layout.height);
      const ids = layout.labels.map((l) => l.id);
      expect(ids).toEqual(expect.arrayContaining(['reaction-left', 'reaction-centre', 'reaction-right']));
      const dims = layout.dimensions.map((d) => d.label.id).sort();
      expect(dims).toEqual(['clear-span-1', 'clear-span-2', 'design-span-1', 'design-span-2']);
      const floor = layout.bands.find((b) => layout.loads[b.loadIndex].label === 'Floor');
      expectApprox(floor?.x ?? NaN, scale.leftCentrePx, tol); // the whole member, end support to end support
      expectApprox((floor?.x ?? 0) + (floor?.width ?? 0), scale.rightCentrePx, tol);
      // the post entered at 17 ft from the left support face, in the second span
      expectApprox(layout.arrows[0].x, scale.leftFacePx + 17 * scale.pxPerFt, tol);
    },
  );

  it.each(WIDTHS)('curves run over both spans at %i px, a guide at every support', (w) => {
    const scale = spanScale(result, w);
    for (const kind of KINDS) {
      const layout = layoutCurve(result, kind, w);
      const [first, last] = pathEnds(layout?.linePath ?? '');
      expectApprox(first, Math.round(scale.leftCentrePx * 10) / 10, { abs: 1e-9 });
      expectApprox(last, Math.round(scale.rightCentrePx * 10) / 10, { abs: 1e-9 });
      expect(layout?.supportXs).toHaveLength(3);
      expectClearBoxes(layout?.labels ?? [], w, layout?.height ?? 0);
    }
  });

  it('labels the hogging moment over the centre post (AWC Design Aid No. 6, two equal spans: M = −wl²/8; figure from memory)', () => {
    // equal design spans, dead load only and no self-weight: nothing is placed span by span
    const equal = check({
      ...twoSpanBody,
      secondClearSpanFt: 12,
      bearingRightIn: 3,
      selfWeight: false,
      sources: [{ kind: 'floor', tributaryFt: 10, deadPsf: 12, livePsf: 0 }],
    });
    const l = equal.spans.designSpanFt;
    expectApprox(equal.spans.secondDesignSpanFt ?? NaN, l, tol);
    const picks = pickCurveValues(equal.diagram?.samples ?? [], 'moment', memberFrame(equal).supports);
    const centre = picks.find((p) => p.role === 'centre-support');
    expectApprox(centre?.value ?? NaN, (-120 * l * l) / 8, { rel: 1e-9 }); // w = 10 ft × 12 psf = 120 plf
    expect(curveText(equal, 'moment')).toContain('at the centre support');
  });

  it('says the spans, every bearing and the centre reaction in words', () => {
    const text = loadDiagramText(result);
    expect(text).toContain(`clear spans 12' 0" and 9' 0" between support faces`);
    expect(text).toContain('at the centre support');
    expect(text).toContain(
      `Post above: dead 700 lb + live 900 lb = 1,600 lb at 17' 0" from the left support face.`,
    );
    expect(text).toContain('over the whole member');
  });
});

describe('a member overhanging both supports', () => {
  const result = check(overhangBody);
  const frame = memberFrame(result);

  it('starts at the tip of the left overhang and ends at the tip of the right one', () => {
    expect(frame.fromLeftTip).toBe(true);
    expectApprox(frame.pieceStartFt, 0, tol);
    expectApprox(frame.pieceEndFt, result.spans.lengthToBuyFt, tol);
    expect(frame.supports.map((s) => s.name)).toEqual(['left', 'right']);
    // positions are entered from the left tip: the analysis frame's own 0
    expectApprox(toEnteredFt(15.5, frame), 15.5, tol);
  });

  it.each(WIDTHS)('draws both overhangs to scale at %i px', (w) => {
    const scale = spanScale(result, w);
    const [left, right] = scale.supports;
    expectApprox(scale.px(0), scale.memberLeftPx, tol);
    expectApprox(scale.px(frame.analysedLengthFt), scale.memberRightPx, tol);
    // an overhang is measured from the support's outer face to the tip
    expectApprox(left.leftFacePx - scale.memberLeftPx, 2 * scale.pxPerFt, tol);
    expectApprox(scale.memberRightPx - right.rightFacePx, 3 * scale.pxPerFt, tol);
    expectApprox(right.leftFacePx - left.rightFacePx, 10 * scale.pxPerFt, tol);

    const layout = layoutLoads(result, w);
    expectClearBoxes([...layout.labels, ...layout.dimensions.map((d) => d.label)], w, layout.height);
    const dims = layout.dimensions.map((d) => d.label.id).sort();
    expect(dims).toEqual(['clear-span', 'design-span', 'overhang-left', 'overhang-right']);
    const roof = layout.bands.find((b) => layout.loads[b.loadIndex].label === 'Roof');
    expectApprox(roof?.x ?? NaN, scale.memberLeftPx, tol); // tip to tip
    expectApprox((roof?.x ?? 0) + (roof?.width ?? 0), scale.memberRightPx, tol);
    expectApprox(layout.arrows[0].x, scale.memberRightPx, tol); // the post at the right tip
  });

  it.each(WIDTHS)('curves run tip to tip at %i px', (w) => {
    const scale = spanScale(result, w);
    for (const kind of KINDS) {
      const layout = layoutCurve(result, kind, w);
      const [first, last] = pathEnds(layout?.linePath ?? '');
      expectApprox(first, Math.round(scale.memberLeftPx * 10) / 10, { abs: 1e-9 });
      expectApprox(last, Math.round(scale.memberRightPx * 10) / 10, { abs: 1e-9 });
      expect(layout?.endXs).toEqual([scale.px(0), scale.px(frame.analysedLengthFt)]);
      expectClearBoxes(layout?.labels ?? [], w, layout?.height ?? 0);
    }
  });

  it('labels the moment at a support from the load on its overhang (AWC Design Aid No. 6, overhanging beam, load at the end: M = P·a)', () => {
    const point = check({
      ...overhangBody,
      overhangLeftFt: undefined,
      selfWeight: false,
      sources: [{ kind: 'point', pointKind: 'post-above', atFt: 13.25, deadLb: 1000 }],
    });
    const f = memberFrame(point);
    // a = the overhang from the right support's centre to the tip: 3 ft + half the 3 in bearing
    const a = 3 + 1.5 / 12;
    expectApprox(f.analysedLengthFt - f.supports[1].atFt, a, tol);
    const picks = pickCurveValues(point.diagram?.samples ?? [], 'moment', f.supports);
    const right = picks.find((p) => p.role === 'right-support');
    expectApprox(right?.value ?? NaN, -1000 * a, { rel: 1e-9 });
    // at the left support of a simple end there is no moment
    expect(picks.find((p) => p.role === 'left-support')?.value).toBe(0);
    // shear labelled on the span's side of the right support: the back-span carries P·a / l upward there
    const shear = pickCurveValues(point.diagram?.samples ?? [], 'shear', f.supports);
    const l = point.spans.designSpanFt;
    expectApprox(shear.find((p) => p.role === 'right-support')?.value ?? NaN, (-1000 * a) / l, { rel: 1e-9 });
  });

  it('labels every curve value the text says, and the loads from the tip', () => {
    for (const kind of KINDS) {
      const text = curveText(result, kind);
      for (const label of layoutCurve(result, kind, 390)?.labels ?? []) expect(text).toContain(label.text);
    }
    const text = loadDiagramText(result);
    expect(text).toContain(`at 15' 6" from the tip of the left overhang`);
    expect(text).toContain(`overhangs 2' 0" past the left support`);
    const samples = result.diagram?.samples ?? [];
    expect(samples.some((s) => curveValue(s, 'moment') < 0)).toBe(true); // hogging over the supports
  });
});
