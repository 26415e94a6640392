import { evaluateSize, type SizeEvaluation } from '@/lib/calc/checks/evaluate-size';
import { DEFAULT_MIN_HEADROOM_IN } from '@/lib/calc/checks/mount-requirements';
import { prepareMember } from '@/lib/calc/checks/prepare-member';
import { sectionFactors } from '@/lib/calc/checks/section-factors';
import { serviceConditions, supportSpec } from '@/lib/calc/checks/check-member';
import { getMaterial, listSizes, sizeIdentity, type Material, type MemberSize } from '@/lib/calc/materials';
import { CAUTION_TEXT } from '@/lib/calc/prescriptive/caution';
import { CalcInputError } from '@/lib/calc/types';
import { CALC_BOUNDS } from '@/shared/schemas/calc/bounds';
import type { CheckId } from '@/shared/schemas/calc/member';
import type { ShortlistEntry, ShortlistInput, ShortlistResult } from '@/shared/schemas/calc/shortlist';
import { pieceWeightLb, sizeFitReason, type FitLimits } from './size-fits';

/** Sizes failing by no more than this utilization are reported as near misses. */
export const NEAR_MISS_LIMIT = 1.15;
const ALL_PLIES = [1, 2, 3, 4];
const DEFAULT_LIMIT = 25;

const CHECK_NAMES: Record<CheckId, string> = {
  bending: 'bending',
  shear: 'shear',
  'deflection-live': 'live deflection',
  'deflection-total': 'total deflection',
  bearing: 'bearing',
};

function fitLimits(input: ShortlistInput): FitLimits {
  let maxDepthIn = input.maxDepthIn ?? null;
  if (maxDepthIn === null && input.mount === 'flush' && input.joistDepthIn !== undefined)
    maxDepthIn = input.joistDepthIn;
  if (maxDepthIn === null && input.mount === 'raised' && input.atticClearanceIn !== undefined)
    maxDepthIn = input.atticClearanceIn;
  if (
    maxDepthIn === null &&
    (input.mount ?? 'dropped') === 'dropped' &&
    input.underJoistsHeightIn !== undefined
  ) {
    maxDepthIn = input.underJoistsHeightIn - (input.minHeadroomIn ?? DEFAULT_MIN_HEADROOM_IN);
  }
  return {
    maxDepthIn,
    maxWidthIn: input.maxWidthIn ?? null,
    maxPieceWeightLb: input.maxPieceWeightLb ?? null,
    maxPieceLengthFt: input.maxPieceLengthFt ?? null,
  };
}

function failingText(evaluation: SizeEvaluation, comboName: (i: number) => string): string {
  const checks = [
    evaluation.bending,
    evaluation.shear,
    evaluation.deflectionLive,
    evaluation.deflectionTotal,
    evaluation.bearing,
  ];
  return checks
    .filter((c) => c.ratio > 1)
    .map((c) => `${CHECK_NAMES[c.id]} ${c.ratio.toFixed(2)} (${comboName(c.combinationIndex)})`)
    .join('; ');
}

function sorter(sortBy: ShortlistResult['sortBy']): (a: ShortlistEntry, b: ShortlistEntry) => number {
  const tie = (a: ShortlistEntry, b: ShortlistEntry) =>
    a.weightPlf - b.weightPlf || a.dIn - b.dIn || b.utilization - a.utilization;
  if (sortBy === 'lightest')
    return (a, b) => a.weightPlf - b.weightPlf || a.dIn - b.dIn || b.utilization - a.utilization;
  if (sortBy === 'fewest-plies') return (a, b) => a.plies - b.plies || a.dIn - b.dIn || tie(a, b);
  if (sortBy === 'cheapest') {
    return (a, b) => (a.cost ?? Infinity) - (b.cost ?? Infinity) || tie(a, b);
  }
  return (a, b) => a.dIn - b.dIn || tie(a, b);
}

/**
 * Checks every size of the chosen materials (plies 1–4 where the material offers them) for one member's
 * loads and keeps what fits: depth (joists for flush, attic clearance for raised, headroom for dropped, or a
 * given maximum), width in the wall, heaviest and longest piece carried in. Passing sizes are sorted
 * shallowest, lightest, fewest plies (then shallowest) or cheapest first (price per ft × length to buy) with
 * their utilization; sizes failing by at most 15 % are listed as
 * near misses with what fails. The loads are analysed once; each size is a superposition (evaluateSize).
 * A material or ply count named twice is checked once; the work (sizes × combinations) is capped at
 * CALC_BOUNDS.shortlistWork.
 *
 * @param input parsed shortlistInputSchema (ft, in, psf, plf, lb; prices per ft)
 * @returns passing sizes, near misses, counts, filters and warnings
 * @throws CalcInputError for unknown materials, invalid loads, or work past the stated ceiling (field
 *   materialIds)
 * @example buildShortlist(shortlistInputSchema.parse({ ...loads, materialIds: ['lvl-2.0e'], sortBy: 'lightest' })).passing[0];
 * Reference: NDS 2018 §§3.3–3.5, 3.10 (through evaluateSize); DESIGN.md §5 "Shortlist".
 */
export function buildShortlist(input: ShortlistInput): ShortlistResult {
  const prepared = prepareMember(input);
  const conditions = serviceConditions(input);
  const support = supportSpec(input).spec;
  const limits = fitLimits(input);
  const { designSpanFt, lengthToBuyFt, clearSpanFt } = prepared.spans;
  const plies = [...new Set(input.plies ?? ALL_PLIES)];
  const materialIds = [...new Set(input.materialIds)];
  let sizeCount = 0;
  for (const materialId of materialIds) sizeCount += listSizes(materialId, { plies }).length;
  const combinationCount = prepared.combinations.filter((c) => !c.skipped).length;
  const work = sizeCount * combinationCount;
  if (work > CALC_BOUNDS.shortlistWork) {
    throw new CalcInputError(
      'materialIds',
      `This shortlist asks for ${work.toLocaleString('en-US')} checks (${sizeCount} sizes × ${combinationCount} load combinations); at most ${CALC_BOUNDS.shortlistWork.toLocaleString('en-US')} per request: choose fewer materials or ply counts`,
    );
  }
  const sortBy = input.sortBy ?? 'shallowest';
  const comboName = (i: number) => prepared.combinations[i].combination.name;
  const warnings = [...prepared.warnings];
  const passing: ShortlistEntry[] = [];
  const nearMisses: ShortlistEntry[] = [];
  let checked = 0;
  let filteredOut = 0;
  let bearingOnly = 0;
  let bearingNeededIn = Infinity;

  const entry = (material: Material, size: MemberSize, evaluation: SizeEvaluation): ShortlistEntry => {
    const price = input.pricePerFt?.[`${material.id}/${size.id}`] ?? input.pricePerFt?.[size.id];
    const governing = evaluation.governing;
    // Object.assign, not a spread followed by more keys: V8 copies that shape slowly (measured in the bench).
    return Object.assign(sizeIdentity(material, size), {
      weightPlf: size.selfWeightPlf,
      pieceWeightLb: pieceWeightLb(size, lengthToBuyFt),
      utilization: governing.ratio,
      governingCheck: governing.id,
      combination: comboName(governing.combinationIndex),
      cost: price === undefined ? null : price * lengthToBuyFt,
    });
  };

  for (const materialId of materialIds) {
    const material = getMaterial(materialId);
    if (material.generic)
      warnings.push(`${material.label}: generic values, confirm with the manufacturer's published values.`);
    for (const size of listSizes(materialId, { plies })) {
      if (sizeFitReason(size, lengthToBuyFt, limits) !== null) {
        filteredOut++;
        continue;
      }
      let evaluation: SizeEvaluation;
      try {
        evaluation = evaluateSize(
          prepared,
          sectionFactors(materialId, size, prepared.geometry.longestSpanFt, conditions),
          size.selfWeightPlf,
          support,
        );
      } catch (error) {
        if (!(error instanceof CalcInputError) || error.field === 'sources') throw error;
        const warning = `${material.label} ${size.label}: ${error.message}`;
        warnings.push(warning);
        continue;
      }
      checked++;
      const ratio = evaluation.governing.ratio;
      const b = evaluation.bearing;
      const othersPass =
        evaluation.bending.ratio <= 1 &&
        evaluation.shear.ratio <= 1 &&
        evaluation.deflectionLive.ratio <= 1 &&
        evaluation.deflectionTotal.ratio <= 1;
      if (b.ratio > 1 && othersPass) {
        bearingOnly++;
        bearingNeededIn = Math.min(bearingNeededIn, b.demand);
      }
      if (evaluation.pass) passing.push(entry(material, size, evaluation));
      else if (ratio <= NEAR_MISS_LIMIT)
        nearMisses.push({
          ...entry(material, size, evaluation),
          failing: failingText(evaluation, comboName),
        });
    }
  }
  passing.sort(sorter(sortBy));
  nearMisses.sort((a, b) => a.utilization - b.utilization);
  const filters: string[] = [];
  if (limits.maxDepthIn !== null) filters.push(`depth at most ${limits.maxDepthIn} in`);
  if (limits.maxWidthIn !== null) filters.push(`width at most ${limits.maxWidthIn} in`);
  if (limits.maxPieceWeightLb !== null) filters.push(`piece weight at most ${limits.maxPieceWeightLb} lb`);
  if (limits.maxPieceLengthFt !== null) filters.push(`piece length at most ${limits.maxPieceLengthFt} ft`);
  if (bearingOnly > 0) {
    warnings.push(
      `${bearingOnly} sizes fail on bearing alone: they need at least ${bearingNeededIn.toFixed(2)} in of bearing at the more heavily loaded end. Lengthen the bearing (more jack studs) and run the shortlist again.`,
    );
  }
  if (sortBy === 'cheapest' && !input.pricePerFt)
    warnings.push('No prices given: sizes without a price sort last.');
  return {
    caution: CAUTION_TEXT,
    sortBy,
    spans: { clearSpanFt, designSpanFt, lengthToBuyFt },
    passing: passing.slice(0, input.limit ?? DEFAULT_LIMIT),
    nearMisses,
    counts: { checked, filteredOut, passing: passing.length },
    filters,
    warnings,
    sources: [
      'NDS 2018 §§3.3–3.5, 3.10 member checks',
      `${input.edition} §2.4.1 ASD load combinations`,
      ...prepared.sources,
    ],
  };
}
