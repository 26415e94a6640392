import { memberCheckInputSchema, type MemberCheckInputBody } from '@/shared/schemas/calc/member';
import type { LoadPathBearing, LoadPathElementData, LoadPathNode } from '@/shared/schemas/calc/load-path';

/** Douglas Fir-Larch No.2: E = 1,600,000 psi (NDS Supplement 2018 Table 4A). */
export const DFL2 = 'sawn-douglas-fir-larch-no2';
export const SPF = 'sawn-spruce-pine-fir-no1-no2';

/** A beam-like element's check input (3 in bearings by default, so the design span is clear + 0.25 ft). */
export const beamInput = (body: Partial<MemberCheckInputBody>) =>
  memberCheckInputSchema.parse({
    kind: 'beam',
    edition: 'ASCE 7-16',
    clearSpanFt: 12,
    sources: [],
    materialId: DFL2,
    sizeId: '3-ply-2x12',
    ...body,
  });

export const node = (
  id: string,
  element: LoadPathElementData,
  bearings: LoadPathBearing[] = [],
  label = id,
): LoadPathNode => ({ id, label, element, bearings });

export const post = (heightFt = 7): LoadPathElementData => ({
  kind: 'post',
  materialId: DFL2,
  sizeId: '6x6',
  heightFt,
});
export const pad = (confirmed = true): LoadPathElementData => ({
  kind: 'footing',
  data: { footing: 'new-pad', confirmed },
});
export const foundationWall = (confirmed = true): LoadPathElementData => ({
  kind: 'foundation-wall',
  confirmed,
});
