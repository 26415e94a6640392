import { describe, expect, it } from 'vitest';
import { chainBelow, evaluateLoadPath } from '@/lib/calc/load-path';
import {
  drawingLayout,
  estimateWidth,
  fromChain,
  wrapWords,
  type DrawingStep,
} from '@/lib/ui/load-path/drawing-layout';
import { beamInput, foundationWall, node, pad, post } from '../../calc/load-path/fixtures';

// Demo-style chain (invented): a beam whose left end bears straight on the basement girder while its right
// end goes through a post, so the left end skips the post's level; the girder bears on a foundation wall
// and a basement post on a new pad. Labels are long on purpose.
const member = beamInput({
  clearSpanFt: 10,
  materialId: 'lvl-2.0e',
  sizeId: '3-ply-1.75x11.875',
  sources: [{ kind: 'floor', tributaryFt: 12, deadPsf: 10, livePsf: 40 }],
});
const girder = beamInput({
  clearSpanFt: 14,
  bearingLeftIn: 5.5,
  bearingRightIn: 5.5,
  materialId: 'lvl-2.0e',
  sizeId: '3-ply-1.75x11.875',
  sources: [{ kind: 'floor', tributaryFt: 4, deadPsf: 10, livePsf: 40 }],
});
const nodes = [
  node(
    'beam',
    { kind: 'member', input: member },
    [
      { end: 'left', ontoId: 'girder', atFt: 3 },
      { end: 'right', ontoId: 'post' },
    ],
    'Kitchen opening beam over the new pass-through to the dining room',
  ),
  node(
    'post',
    post(8),
    [{ end: 'bottom', ontoId: 'girder', atFt: 10, through: 'squash-blocks' }],
    'Post in the hall closet',
  ),
  node(
    'girder',
    { kind: 'girder', input: girder },
    [
      { end: 'left', ontoId: 'fw' },
      { end: 'right', ontoId: 'post2' },
    ],
    'Basement girder (built-up, measured 3 × 1.5 × 9.25 in)',
  ),
  node('post2', post(7), [{ end: 'bottom', ontoId: 'pad' }], 'Basement post'),
  node('fw', foundationWall(), [], 'Foundation wall'),
  node('pad', pad(), [], 'New pad'),
];
const chain = chainBelow(evaluateLoadPath({ edition: 'ASCE 7-16', nodes }), 'beam');
const steps = fromChain(chain);

describe('wrapWords', () => {
  it('keeps whole words and stays inside the width', () => {
    const text = 'Basement girder under the kitchen and the dining room';
    const lines = wrapWords(text, 90, 12);
    expect(lines.join(' ')).toBe(text);
    for (const line of lines) {
      expect(estimateWidth(line, 12)).toBeLessThanOrEqual(90);
      for (const word of line.split(' ')) expect(text.split(' ')).toContain(word);
    }
  });

  it('splits only a word that is wider than the line by itself', () => {
    const lines = wrapWords('Supercalifragilistic', 40, 12);
    expect(lines.join('')).toBe('Supercalifragilistic');
    expect(lines.length).toBeGreaterThan(1);
  });
});

describe('drawingLayout', () => {
  it('has the chain the test is about (a level-skipping end)', () => {
    expect(steps.map((s) => [s.id, s.depth])).toEqual([
      ['beam', 0],
      ['post', 1],
      ['girder', 2],
      ['fw', 3],
      ['post2', 3],
      ['pad', 4],
    ]);
  });

  for (const width of [390 - 32, 390, 1280]) {
    describe(`at ${width} wide`, () => {
      const layout = drawingLayout(steps, width);

      it('draws every element of the chain once, and every end once', () => {
        expect(layout.boxes.map((b) => b.id).sort()).toEqual(steps.map((s) => s.id).sort());
        const ends = steps.reduce((n, s) => n + s.ends.length, 0);
        expect(layout.links).toHaveLength(ends);
      });

      it('orders the levels from the top down, boxes not overlapping', () => {
        const rows = [...new Set(layout.boxes.map((b) => b.depth))].sort((a, b) => a - b);
        for (let i = 1; i < rows.length; i++) {
          const above = layout.boxes.filter((b) => b.depth === rows[i - 1]);
          const below = layout.boxes.filter((b) => b.depth === rows[i]);
          for (const a of above) for (const b of below) expect(b.y).toBeGreaterThan(a.y + a.h);
        }
      });

      it('draws the level-skipping end across the levels it spans without crossing a box', () => {
        const skip = layout.links.find((l) => l.fromId === 'beam' && l.toId === 'girder');
        expect(skip).toBeDefined();
        const s = skip as NonNullable<typeof skip>;
        expect([s.fromDepth, s.toDepth]).toEqual([0, 2]);
        const post = layout.boxes.find((b) => b.id === 'post') as (typeof layout.boxes)[number];
        const girderBox = layout.boxes.find((b) => b.id === 'girder') as (typeof layout.boxes)[number];
        const ys = s.points.map((p) => p.y);
        expect(Math.min(...ys)).toBeLessThan(post.y);
        expect(Math.max(...ys)).toBe(girderBox.y);
        for (let i = 1; i < s.points.length; i++) {
          const [a, b] = [s.points[i - 1], s.points[i]];
          const vertical = a.x === b.x;
          const crosses = vertical
            ? a.x > post.x &&
              a.x < post.x + post.w &&
              Math.max(a.y, b.y) > post.y &&
              Math.min(a.y, b.y) < post.y + post.h
            : a.y > post.y && a.y < post.y + post.h;
          expect(crosses).toBe(false);
        }
      });

      it('runs a skipping line down the nearer side, its runs across clear of every chip and box', () => {
        const skip = layout.links.find((l) => l.fromId === 'beam' && l.toId === 'girder');
        const s = skip as NonNullable<typeof skip>;
        // The beam's left end leaves from the left quarter of the top box: its lane is at the left edge.
        const laneX = Math.min(...s.points.map((p) => p.x));
        expect(laneX).toBeLessThan(Math.min(...layout.boxes.map((b) => b.x)));
        for (let i = 1; i < s.points.length; i++) {
          const [a, b] = [s.points[i - 1], s.points[i]];
          if (a.y !== b.y) continue;
          const [x0, x1] = [Math.min(a.x, b.x), Math.max(a.x, b.x)];
          const through = (r: { x: number; y: number; w: number; h: number }) =>
            a.y > r.y && a.y < r.y + r.h && x1 > r.x && x0 < r.x + r.w;
          for (const other of layout.links) expect(through(other.chip), other.label.text).toBe(false);
          for (const box of layout.boxes) expect(through(box), box.id).toBe(false);
        }
      });

      it('keeps every label and chip inside the width', () => {
        for (const t of layout.texts) {
          const box = layout.boxes.find(
            (b) => t.x >= b.x && t.x <= b.x + b.w && t.y >= b.y && t.y <= b.y + b.h,
          );
          expect(box, t.text).toBeDefined();
          const b = box as NonNullable<typeof box>;
          expect(t.x + estimateWidth(t.text, t.size), t.text).toBeLessThanOrEqual(b.x + b.w);
          expect(t.x + estimateWidth(t.text, t.size)).toBeLessThanOrEqual(width);
        }
        for (const l of layout.links) {
          expect(l.chip.x).toBeGreaterThanOrEqual(0);
          expect(l.chip.x + l.chip.w).toBeLessThanOrEqual(width);
        }
        for (const b of layout.boxes) expect(b.x + b.w).toBeLessThanOrEqual(width);
      });

      it('shows each long label whole, in whole words', () => {
        const all = layout.texts.map((t) => t.text).join(' ');
        for (const s of steps) expect(all).toContain(s.label.split(' ').slice(0, 2).join(' '));
        const words = new Set(steps.flatMap((s) => s.label.split(' ')));
        const title = layout.texts.filter((t) => t.size === 13).flatMap((t) => t.text.split(' '));
        for (const w of title) expect(words.has(w), w).toBe(true);
      });
    });
  }
});

// Invented: a girder made two spans by a new post, its left and right ends on one foundation wall box and
// its centre on the post, so the right end's line crosses the centre's on the way down.
const twoSpan: DrawingStep[] = [
  {
    id: 'girder',
    label: 'Basement girder',
    kind: 'girder',
    state: 'passes',
    depth: 0,
    ends: [
      { end: 'left', ontoId: 'fw', governingLb: 470 },
      { end: 'centre', ontoId: 'post', governingLb: 5490 },
      { end: 'right', ontoId: 'fw', governingLb: 510 },
    ],
  },
  { id: 'fw', label: 'Foundation wall', kind: 'foundation-wall', state: 'passes', depth: 1, ends: [] },
  {
    id: 'post',
    label: 'Post under the girder',
    kind: 'post',
    state: 'passes',
    depth: 1,
    ends: [{ end: 'bottom', ontoId: 'pad', governingLb: 5540 }],
  },
  { id: 'pad', label: 'New pad', kind: 'footing', state: 'passes', depth: 2, ends: [] },
];

describe('chips', () => {
  for (const [name, chainSteps] of [
    ['the skipping chain', steps],
    ['a two-span girder with crossing ends', twoSpan],
  ] as const)
    for (const width of [390 - 32, 390, 1280])
      it(`no line strikes through another end's chip, and no chips overlap (${name}, ${width} wide)`, () => {
        const { links } = drawingLayout(chainSteps, width);
        for (const link of links) {
          for (const other of links) {
            if (other === link) continue;
            const c = link.chip;
            const struck = other.points.some((p, i) => {
              if (i === 0) return false;
              const q = other.points[i - 1];
              return Array.from({ length: 101 }, (_, k) => ({
                x: q.x + ((p.x - q.x) * k) / 100,
                y: q.y + ((p.y - q.y) * k) / 100,
              })).some((pt) => pt.x > c.x && pt.x < c.x + c.w && pt.y > c.y && pt.y < c.y + c.h);
            });
            expect(struck, `${other.label.text} line through ${link.label.text} chip`).toBe(false);
            const o = other.chip;
            const overlap = c.x < o.x + o.w && o.x < c.x + c.w && c.y < o.y + o.h && o.y < c.y + c.h;
            expect(overlap, `${link.label.text} on ${other.label.text}`).toBe(false);
          }
        }
      });
});
