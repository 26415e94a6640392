import { describe, expect, it } from 'vitest';
import type { Box } from '@/lib/ui/diagrams/label-placement';
import { layoutLoads, type LoadLayout } from '@/lib/ui/diagrams/load-layout';
import { spanScale } from '@/lib/ui/diagrams/span-frame';
import type { MemberCheckInputBody } from '@/shared/schemas/calc/member';
import { expectApprox } from '@/tests/helpers/approx';
import { busyBody, check, expectClearBoxes, fixtureBody, headerBody, seeded, WIDTHS } from './cases';

function allChips(layout: LoadLayout): Box[] {
  return [...layout.labels, ...layout.dimensions.map((d) => d.label)];
}

/** Load-label chips that an arrow of another load runs through, each once. */
function arrowCrossings(layout: LoadLayout): string[] {
  const out = new Set<string>();
  for (const label of layout.labels.filter((l) => l.id.startsWith('load-'))) {
    for (const arrow of layout.arrows) {
      if (label.id === `load-${arrow.loadIndex}`) continue;
      const inX = arrow.x >= label.x && arrow.x <= label.x + label.width;
      const inY = arrow.yTop < label.y + label.height && arrow.yBottom > label.y;
      if (inX && inY) out.add(label.id);
    }
  }
  return [...out];
}

describe.each(WIDTHS)('load diagram at %i px', (width) => {
  it.each([
    ['fixture', fixtureBody],
    ['busy', busyBody],
    ['header', headerBody],
  ] as const)(
    '%s: every load has a label, no two chips overlap, none runs off the drawing',
    (_name, body) => {
      const layout = layoutLoads(check(body), width);
      expectClearBoxes(allChips(layout), width, layout.height);
      layout.loads.forEach((_, i) => expect(layout.labels.some((l) => l.id === `load-${i}`)).toBe(true));
      expect(arrowCrossings(layout)).toEqual(layout.crossings);
    },
  );

  it('fixture: labels read source, types and service load, and sit over no arrow', () => {
    const layout = layoutLoads(check(fixtureBody), width);
    const texts = layout.labels.map((l) => l.text);
    // the fixture's floor: 12 ft × 12 psf dead + 12 ft × 40 psf live = 144 + 480 plf
    expect(texts).toContain('Floor · D+L 624 plf');
    expect(texts).toContain('Wall above · D 48 plf'); // 8 ft × 6 psf
    expect(texts).toContain('Post above · D+L 1,500 lb'); // 600 + 900 lb
    expect(layout.crossings).toEqual([]);
    expect(texts).toContain('R 5,381 lb');
    expect(texts).toContain('R 5,638 lb');
    expect(texts.filter((t) => t === '4-1/2" bearing')).toHaveLength(2);
    expect(layout.dimensions.map((d) => d.label.text)).toEqual([
      `clear span 14' 0"`,
      `design span 14' 4-1/2"`,
    ]);
  });

  it('fixture: loads to scale along the span, positions as entered from the support face', () => {
    const result = check(fixtureBody);
    const layout = layoutLoads(result, width);
    const scale = spanScale(result, width);
    const face = scale.leftFacePx;
    const post = layout.arrows[0];
    expectApprox(post.x, face + 9 * scale.pxPerFt, { abs: 1e-9 }); // the input's post at 9 ft
    const wall = layout.bands.find((b) => layout.loads[b.loadIndex].label === 'Wall above');
    expectApprox(wall?.x ?? NaN, face, { abs: 1e-9 }); // 0 to 6 ft
    expectApprox(wall?.width ?? NaN, 6 * scale.pxPerFt, { abs: 1e-9 });
    const floor = layout.bands.find((b) => layout.loads[b.loadIndex].label === 'Floor');
    expectApprox(floor?.x ?? NaN, scale.leftCentrePx, { abs: 1e-9 }); // full span: bearing centre to centre
    expectApprox((floor?.x ?? 0) + (floor?.width ?? 0), scale.rightCentrePx, { abs: 1e-9 });
    expect(floor?.height).toBeGreaterThan(wall?.height ?? Infinity); // 624 plf drawn deeper than 48 plf
    expect(post.yBottom).toBe(layout.beam.y);
  });

  it('bearings are drawn to scale under the ends of the piece', () => {
    const result = check(busyBody); // 3 in left, 6 in right
    const layout = layoutLoads(result, width);
    const scale = spanScale(result, width);
    const [left, right] = layout.bearings;
    expectApprox(left.width, Math.max(4, (3 / 12) * scale.pxPerFt), { abs: 1e-9 });
    expectApprox(right.width, Math.max(4, (6 / 12) * scale.pxPerFt), { abs: 1e-9 });
    expectApprox(right.x + right.width, scale.memberRightPx, { abs: 1e-9 });
  });
});

describe('load rows', () => {
  it('stacks partial loads that fit side by side in one row', () => {
    const body: MemberCheckInputBody = {
      ...headerBody,
      clearSpanFt: 16,
      sources: [
        { kind: 'ceiling', tributaryFt: 7, deadPsf: 8, livePsf: 10, startFt: 0, endFt: 7 },
        { kind: 'floor', tributaryFt: 6, deadPsf: 12, livePsf: 40, startFt: 9, endFt: 16 },
      ],
      selfWeight: false,
    };
    const layout = layoutLoads(check(body), 390);
    expect(layout.bands).toHaveLength(2);
    expect(layout.bands[0].y).toBe(layout.bands[1].y);
  });

  it('puts overlapping partial loads in separate rows', () => {
    const body: MemberCheckInputBody = {
      ...headerBody,
      clearSpanFt: 16,
      sources: [
        { kind: 'ceiling', tributaryFt: 7, deadPsf: 8, livePsf: 10, startFt: 0, endFt: 9 },
        { kind: 'floor', tributaryFt: 6, deadPsf: 12, livePsf: 40, startFt: 7, endFt: 16 },
      ],
      selfWeight: false,
    };
    const layout = layoutLoads(check(body), 390);
    expect(layout.bands[0].y).not.toBe(layout.bands[1].y);
  });

  it.each(WIDTHS)('never overlaps chips on many seeded crowded beams at %i px', (width) => {
    const rand = seeded(7);
    for (let n = 0; n < 30; n++) {
      const span = 4 + Math.round(rand() * 20);
      const at = () => Math.round(rand() * span * 4) / 4;
      const sources: MemberCheckInputBody['sources'] = [
        { kind: 'roof', tributaryFt: 10, deadPsf: 15, roofLivePsf: 20 },
      ];
      for (let k = 0; k < 1 + Math.floor(rand() * 4); k++) {
        const a = at();
        const b = at();
        if (a !== b)
          sources.push({
            kind: 'wall-above',
            wPlf: 50 + Math.round(rand() * 300),
            startFt: Math.min(a, b),
            endFt: Math.max(a, b),
          });
      }
      for (let k = 0; k < Math.floor(rand() * 5); k++) {
        sources.push({
          kind: 'point',
          pointKind: 'post-above',
          atFt: at(),
          deadLb: 200 + Math.round(rand() * 3000),
        });
      }
      const layout = layoutLoads(check({ ...headerBody, kind: 'beam', clearSpanFt: span, sources }), width);
      expectClearBoxes(allChips(layout), width, layout.height);
      expect(arrowCrossings(layout)).toEqual(layout.crossings);
    }
  });
});
