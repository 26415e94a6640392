import { describe, expect, it } from 'vitest';
import { placeLabels, type LabelRequest } from '@/lib/ui/diagrams/label-placement';
import { chipWidth, LABEL_HEIGHT } from '@/lib/ui/diagrams/text-metrics';
import { expectApprox } from '@/tests/helpers/approx';
import { expectClearBoxes, seeded, WIDTHS } from './cases';

const HEIGHT = 150;

function crowd(width: number, count: number, seed: number): LabelRequest[] {
  const rand = seeded(seed);
  return Array.from({ length: count }, (_, i) => ({
    id: `l${i}`,
    text: `${Math.round(rand() * 30000).toLocaleString('en-US')} lb·ft`,
    anchorX: rand() * width,
    anchorY: 20 + rand() * (HEIGHT - 40),
    side: rand() < 0.5 ? 'above' : 'below',
    priority: i,
  }));
}

describe('placeLabels', () => {
  it('puts a lone label centred just above its anchor', () => {
    const text = '21,115 lb·ft';
    const { placed, dropped } = placeLabels(
      [{ id: 'max', text, anchorX: 200, anchorY: 60, side: 'above', priority: 0 }],
      { x: 0, y: 0, width: 390, height: HEIGHT },
    );
    expect(dropped).toEqual([]);
    expectApprox(placed[0].x, 200 - chipWidth(text) / 2, { abs: 1e-9 });
    expect(placed[0].y + LABEL_HEIGHT).toBeLessThanOrEqual(60);
  });

  it('keeps a label at the edge inside the drawing', () => {
    const { placed } = placeLabels(
      [{ id: 'left', text: '5,381 lb', anchorX: 12, anchorY: 10, side: 'above', priority: 0 }],
      { x: 0, y: 0, width: 280, height: HEIGHT },
    );
    expectApprox(placed[0].x, 0, { abs: 1e-9 });
    expectApprox(placed[0].y, 0, { abs: 1e-9 });
  });

  it('slides a second label along x rather than covering the first', () => {
    const requests: LabelRequest[] = [
      { id: 'a', text: '5,381 lb', anchorX: 100, anchorY: 60, side: 'above', priority: 0 },
      { id: 'b', text: '5,200 lb', anchorX: 110, anchorY: 60, side: 'above', priority: 1 },
    ];
    const { placed, dropped } = placeLabels(requests, { x: 0, y: 0, width: 390, height: HEIGHT });
    expect(dropped).toEqual([]);
    expectClearBoxes(placed, 390, HEIGHT);
    expectApprox(placed[0].x, 100 - chipWidth('5,381 lb') / 2, { abs: 1e-9 });
  });

  it.each(WIDTHS)('never overlaps two labels in crowded drawings at %i px, and keeps the first', (width) => {
    for (let seed = 1; seed <= 40; seed++) {
      const requests = crowd(width, 14, seed);
      const { placed, dropped } = placeLabels(requests, { x: 0, y: 0, width, height: HEIGHT });
      expectClearBoxes(placed, width, HEIGHT);
      expect(placed.length + dropped.length).toBe(requests.length);
      expect(placed.some((p) => p.id === 'l0')).toBe(true);
    }
  });

  it('drops the lower-priority label when two cannot both fit', () => {
    const requests: LabelRequest[] = [
      { id: 'minor', text: '0 lb·ft', anchorX: 20, anchorY: 9, side: 'above', priority: 2 },
      { id: 'major', text: '1,234,567 lb·ft', anchorX: 40, anchorY: 9, side: 'above', priority: 0 },
    ];
    const { placed, dropped } = placeLabels(requests, { x: 0, y: 0, width: 140, height: LABEL_HEIGHT });
    expect(placed.map((p) => p.id)).toEqual(['major']);
    expect(dropped).toEqual(['minor']);
  });
});
