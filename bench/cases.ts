import { listMaterials } from '@/lib/calc';
import { memberCheckInputSchema } from '@/shared/schemas/calc/member';
import { shortlistInputSchema } from '@/shared/schemas/calc/shortlist';
import { spanTableInputSchema } from '@/shared/schemas/calc/span-table';

/** Demo loads for the benchmark (invented, typical of a bearing wall under a floor and a roof). */
const sources = [
  { kind: 'roof', tributaryFt: 14, deadPsf: 15, roofLivePsf: 20 },
  { kind: 'ceiling', tributaryFt: 7, deadPsf: 10, livePsf: 10 },
  { kind: 'floor', tributaryFt: 12, deadPsf: 12, livePsf: 40 },
  { kind: 'point', pointKind: 'post-above', atFt: 4, deadLb: 600, liveLb: 900 },
] as const;

/** One member check: a 12 ft beam with roof, ceiling, floor and a post above, snow by ASCE 7-22. */
export const memberCase = memberCheckInputSchema.parse({
  kind: 'beam',
  edition: 'ASCE 7-22',
  clearSpanFt: 12,
  bearingLeftIn: 4.5,
  bearingRightIn: 4.5,
  roofPitchIn12: 6,
  snow: { groundSnowPsf: 30 },
  sources,
  materialId: 'lvl-2.0e',
  sizeId: '3-ply-1.75x11.875',
});

/** The same member, every size of every material. */
export const shortlistCase = shortlistInputSchema.parse({
  ...memberCase,
  materialIds: listMaterials().map((m) => m.id),
  sortBy: 'lightest',
});

/** All sawn sizes (1–4 plies) × 8 tributary widths. */
export const spanTableCase = spanTableInputSchema.parse({
  edition: 'ASCE 7-22',
  deadPsf: 12,
  livePsf: 40,
  tributaryWidthsFt: [2, 4, 6, 8, 10, 12, 14, 16],
  materialIds: listMaterials('sawn').map((m) => m.id),
});

/**
 * The heaviest span table the API allows: every size of every material × 12 tributary widths under dead
 * and floor live load (about 20,000 checks, under the engine's per-request cap).
 */
export const heaviestSpanTableCase = spanTableInputSchema.parse({
  edition: 'ASCE 7-22',
  deadPsf: 12,
  livePsf: 40,
  tributaryWidthsFt: [1, 2, 3, 4, 5, 6, 8, 10, 12, 14, 16, 20],
  materialIds: listMaterials().map((m) => m.id),
});

/** The heaviest shortlist the API allows: every size of every material under 40 point loads. */
export const heaviestShortlistCase = shortlistInputSchema.parse({
  ...memberCase,
  sources: Array.from({ length: 40 }, (_, i) => ({
    kind: 'point',
    pointKind: 'post-above',
    atFt: 0.25 + i * 0.28,
    deadLb: 300,
    liveLb: 400,
  })),
  materialIds: listMaterials().map((m) => m.id),
  sortBy: 'lightest',
});
