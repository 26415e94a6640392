import { buildShortlist, CalcInputError, listMaterials } from '@/lib/calc';
import { parseNumberText } from '@/lib/ui/number-text';
import type { MemberCheckInput } from '@/shared/schemas/calc/member';
import {
  shortlistInputSchema,
  type ShortlistResult,
  type shortlistSorts,
} from '@/shared/schemas/calc/shortlist';
import type { MaterialFamily } from './choices';

export type ShortlistSort = (typeof shortlistSorts)[number];

/** The "Find sizes" filters as typed. Empty limits mean no limit (or the engine's own default). */
export type ShortlistFilters = {
  families: MaterialFamily[];
  maxDepth: string;
  maxWidth: string;
  maxPieceWeight: string;
  maxPieceLength: string;
  sortBy: ShortlistSort;
};

export const defaultShortlistFilters = (): ShortlistFilters => ({
  families: ['sawn', 'lvl', 'glulam'],
  maxDepth: '',
  maxWidth: '',
  maxPieceWeight: '',
  maxPieceLength: '',
  sortBy: 'shallowest',
});

export type ShortlistRun =
  { ok: true; result: ShortlistResult } | { ok: false; errors: Record<string, string[]> };

/**
 * The shortlist for a checked member's loads and the filters, run by the engine on the device.
 * @example runShortlist(live.input, defaultShortlistFilters()).ok
 */
export function runShortlist(input: MemberCheckInput, filters: ShortlistFilters): ShortlistRun {
  const errors: Record<string, string[]> = {};
  const limit = (field: keyof ShortlistFilters, text: string) => {
    const read = parseNumberText(text);
    if (read.kind === 'empty') return undefined;
    if (read.kind === 'number' && read.value > 0) return read.value;
    errors[field] = ['Enter a number above 0, or leave it empty'];
    return undefined;
  };
  const materialIds = listMaterials()
    .filter((m) => filters.families.includes(m.family))
    .map((m) => m.id);
  if (materialIds.length === 0) errors.families = ['Pick at least one material'];
  const body = {
    ...input,
    materialId: undefined,
    sizeId: undefined,
    plies: undefined,
    gradeUnknown: undefined,
    measuredPly: undefined,
    posts: undefined,
    materialIds,
    maxDepthIn: limit('maxDepth', filters.maxDepth),
    maxWidthIn: limit('maxWidth', filters.maxWidth),
    maxPieceWeightLb: limit('maxPieceWeight', filters.maxPieceWeight),
    maxPieceLengthFt: limit('maxPieceLength', filters.maxPieceLength),
    sortBy: filters.sortBy,
    limit: 40,
  };
  if (Object.keys(errors).length) return { ok: false, errors };
  const parsed = shortlistInputSchema.safeParse(body);
  if (!parsed.success) return { ok: false, errors: { _: parsed.error.issues.map((i) => i.message) } };
  try {
    return { ok: true, result: buildShortlist(parsed.data) };
  } catch (error) {
    if (error instanceof CalcInputError) return { ok: false, errors: { _: [error.message] } };
    throw error;
  }
}
