import { readFileSync } from 'node:fs';
import { expect } from 'vitest';
import { checkMember } from '@/lib/calc';
import { boxesOverlap, type Box } from '@/lib/ui/diagrams/label-placement';
import { memberCheckInputSchema, type MemberCheckInputBody } from '@/shared/schemas/calc/member';

/** The widths every diagram must stay legible at: a phone (390 px) and a narrow column (280 px). */
export const WIDTHS = [390, 280] as const;

export function check(body: MemberCheckInputBody) {
  return checkMember(memberCheckInputSchema.parse(body), { diagrams: true });
}

/** The repository's flush LVL fixture: floor, a partial wall above and a post, 4-1/2 in bearings. */
export const fixtureBody: MemberCheckInputBody = JSON.parse(
  readFileSync('tests/fixtures/calc/member-flush-lvl-point.input.json', 'utf8'),
);

/** A crowded beam (test input, not a published case): roof with snow, three partial loads, three point loads. */
export const busyBody: MemberCheckInputBody = {
  kind: 'beam',
  edition: 'ASCE 7-22',
  clearSpanFt: 16,
  bearingLeftIn: 3,
  bearingRightIn: 6,
  roofPitchIn12: 6,
  snow: { groundSnowPsf: 40 },
  sources: [
    { kind: 'roof', tributaryFt: 8, deadPsf: 15, roofLivePsf: 20 },
    { kind: 'ceiling', tributaryFt: 7, deadPsf: 8, livePsf: 10, startFt: 0, endFt: 7 },
    { kind: 'floor', tributaryFt: 6, deadPsf: 12, livePsf: 40, startFt: 9, endFt: 16 },
    {
      kind: 'wall-above',
      label: 'Bathroom wall with tile and a long label',
      wPlf: 120,
      startFt: 4,
      endFt: 10,
    },
    { kind: 'point', pointKind: 'post-above', atFt: 5, deadLb: 800, liveLb: 1200 },
    { kind: 'point', pointKind: 'girder-truss', atFt: 6, deadLb: 900, snowLb: 1500 },
    { kind: 'point', pointKind: 'heavy-fixture', label: 'Water heater', atFt: 13.5, deadLb: 500 },
  ],
  materialId: 'lvl-2.0e',
  sizeId: '3-ply-1.75x14',
};

/** A roof header under a full-span uniform load (test input). */
export const headerBody: MemberCheckInputBody = {
  kind: 'header',
  edition: 'ASCE 7-16',
  clearSpanFt: 6,
  sources: [{ kind: 'roof', tributaryFt: 14, deadPsf: 15, roofLivePsf: 20 }],
  materialId: 'sawn-douglas-fir-larch-no2',
  sizeId: '2-ply-2x10',
};

/** Asserts that no two boxes share any area and that each lies inside [0, width] × [0, height]. */
export function expectClearBoxes(boxes: readonly Box[], width: number, height: number): void {
  for (const b of boxes) {
    expect(b.x).toBeGreaterThanOrEqual(0);
    expect(b.y).toBeGreaterThanOrEqual(0);
    expect(b.x + b.width).toBeLessThanOrEqual(width);
    expect(b.y + b.height).toBeLessThanOrEqual(height);
  }
  for (let i = 0; i < boxes.length; i++) {
    for (let j = i + 1; j < boxes.length; j++) {
      expect(boxesOverlap(boxes[i], boxes[j], 0), `boxes ${i} and ${j} overlap`).toBe(false);
    }
  }
}

/** A small seeded generator (Park–Miller), so the crowded layouts tested are the same on every run. */
export function seeded(seed: number): () => number {
  let s = seed;
  return () => {
    s = (s * 48271) % 2147483647;
    return s / 2147483647;
  };
}

/** A floor beam continuous over a centre post into a second, shorter span, a post above in the second (test input). */
export const twoSpanBody: MemberCheckInputBody = {
  kind: 'beam',
  edition: 'ASCE 7-16',
  clearSpanFt: 12,
  secondClearSpanFt: 9,
  bearingLeftIn: 3,
  bearingRightIn: 4.5,
  centreBearingIn: 3.5,
  sources: [
    { kind: 'floor', tributaryFt: 10, deadPsf: 12, livePsf: 40 },
    { kind: 'point', pointKind: 'post-above', atFt: 17, deadLb: 700, liveLb: 900 },
  ],
  materialId: 'lvl-2.0e',
  sizeId: '3-ply-1.75x11.875',
};

/** A roof beam overhanging both supports, a point load at the right tip (test input). */
export const overhangBody: MemberCheckInputBody = {
  kind: 'beam',
  edition: 'ASCE 7-16',
  clearSpanFt: 10,
  overhangLeftFt: 2,
  overhangRightFt: 3,
  sources: [
    { kind: 'roof', tributaryFt: 6, deadPsf: 15, roofLivePsf: 20 },
    { kind: 'point', pointKind: 'post-above', atFt: 15.5, deadLb: 400, liveLb: 0, roofLiveLb: 300 },
  ],
  materialId: 'lvl-2.0e',
  sizeId: '2-ply-1.75x11.875',
};
