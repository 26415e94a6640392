import { LOAD_DEFAULTS, listMaterials, listSizes } from '@/lib/calc';
import type { MaterialFamily } from '@/lib/ui/member/choices';
import type { DeflectionUse } from '@/shared/schemas/calc/member';
import type { LoadStandard } from '@/shared/schemas/jobs';

/** The span table form as typed: numbers and lengths stay text until span-table-input.ts reads them. */
export type SpanTableDraft = {
  family: MaterialFamily;
  materialId: string;
  edition: LoadStandard;
  deadPsf: string;
  livePsf: string;
  roofLivePsf: string;
  roofSnowPsf: string;
  deflectionUse: DeflectionUse;
  /** Bearing length at each end; bare numbers are inches. */
  bearing: string;
  /** Tributary widths, separated by commas; bare numbers are feet. */
  widths: string;
  plies: number[];
  selfWeight: boolean;
  /** Print design spans (support centre to support centre) instead of clear spans. */
  designSpans: boolean;
};

/** The ply counts a material comes in, fewest first (glulam: one). */
export function plyCounts(materialId: string): number[] {
  return [...new Set(listSizes(materialId).map((s) => s.plies))].sort((a, b) => a - b);
}

/** The first material of a family, the one a change of family lands on. */
export function firstMaterialOf(family: MaterialFamily): string {
  return listMaterials(family)[0]?.id ?? '';
}

/** Douglas Fir-Larch No.2: No.2 is the common framing grade (common practice). */
export const DEFAULT_MATERIAL_ID = 'sawn-douglas-fir-larch-no2';

/**
 * A new form: a floor over the member at the defaults the member editor offers (dead load of a light-frame
 * floor, HUD RSDG Table 3.2; live load of dwelling rooms, ASCE 7-16 Table 4.3-1), 3 in bearing (two jack
 * studs, common practice), one to three plies.
 */
export function emptySpanTableDraft(): SpanTableDraft {
  const materialId = DEFAULT_MATERIAL_ID;
  return {
    family: 'sawn',
    materialId,
    edition: 'ASCE 7-22',
    deadPsf: String(LOAD_DEFAULTS.floorDead.psf),
    livePsf: String(LOAD_DEFAULTS.floorLive.psf),
    roofLivePsf: '',
    roofSnowPsf: '',
    deflectionUse: 'floor',
    bearing: '3',
    widths: '4, 8, 12, 16',
    plies: plyCounts(materialId).filter((p) => p <= 3),
    selfWeight: true,
    designSpans: false,
  };
}

/** The draft after choosing a material: the plies it doesn't come in are dropped (all of its own if none is left). */
export function withMaterial(draft: SpanTableDraft, materialId: string): SpanTableDraft {
  const offered = plyCounts(materialId);
  const kept = draft.plies.filter((p) => offered.includes(p));
  return { ...draft, materialId, plies: kept.length ? kept : offered };
}
