import { serviceConditions, supportSpec } from '@/lib/calc/checks/check-member';
import { creepFactor } from '@/lib/calc/checks/creep';
import { DEFAULT_BEARING_IN } from '@/lib/calc/checks/prepare-member';
import { DEFLECTION_PRESETS } from '@/lib/calc/checks/deflection-presets';
import { sectionFactors } from '@/lib/calc/checks/section-factors';
import { formatNumber, formatSpanFtIn } from '@/lib/format';
import { asdCombinations } from '@/lib/calc/loads';
import { getMaterial, listSizes } from '@/lib/calc/materials';
import { CAUTION_TEXT } from '@/lib/calc/prescriptive/caution';
import { CalcInputError, type LoadCombination, type LoadType } from '@/lib/calc/types';
import { CALC_BOUNDS } from '@/shared/schemas/calc/bounds';
import type { SpanTableInput, SpanTableLayout, SpanTableResult } from '@/shared/schemas/calc/span-table';
import { patternedLayout, patternedSpanLimits } from './patterned-span-limits';
import { uniformSpanLimits, type UniformSpanCase } from './uniform-span-limits';

const IN_PER_FT = 12;
/** Overhang of the 'overhang' layout when none is given: a quarter of the back span (common practice). */
const DEFAULT_OVERHANG_FRACTION = 0.25;
/** Span used to look up section factors; only glulam C_V depends on span and it is solved per span. */
const LOOKUP_SPAN_FT = 21;

function layoutNotes(layout: SpanTableLayout, overhangFraction: number): string[] {
  if (layout === 'simple') return ['One simple span between two supports.'];
  const patterned =
    'Live, roof live and snow loads also placed span by span (ASCE 7 §4.3.3; snow at half elsewhere, §7.5).';
  if (layout === 'two-span') {
    return [
      `Two equal spans continuous over a centre post, each the span shown; the centre post carries about 1.25 × the load of one span (AWC Design Aid No. 6). ${patterned}`,
    ];
  }
  return [
    `One span with an overhang of ${formatNumber(overhangFraction, 2)} × the span past one support (the span shown is the back span); the overhang's deflection is held to twice its length in the limits. ${patterned}`,
  ];
}

/**
 * A span table for the user's own loads: for each size of the chosen materials and each tributary width,
 * the largest span it carries (printed as the clear span unless the design span is asked for) under D (+ self-weight), L, Lr and S per foot of tributary width, by
 * the same rules as the member check (ASD combinations of the edition, C_D per combination, bending with
 * C_L = 1.0 for a braced top edge, shear at d, live and total deflection with creep, bearing on the member
 * and the plate), each limit solved in closed form (glulam bending by bisection to 1/16 in). Never a code
 * table: the numbers come from the user's loads. Two equal continuous spans or a span with an overhang are
 * solved the same way from a unit member (patternedSpanLimits). A material or ply count named twice is
 * tabulated once; the
 * work (sizes × widths × combinations) is capped at CALC_BOUNDS.spanTableWork.
 *
 * @param input parsed spanTableInputSchema (psf, ft, in)
 * @returns rows by size with one cell per tributary width (span ft, printed ft-in, the governing check)
 * @throws CalcInputError for unknown materials, no load at all, or work past the stated ceiling (field
 *   materialIds)
 * @example buildSpanTable(spanTableInputSchema.parse({ edition: 'ASCE 7-16', deadPsf: 10, livePsf: 40, tributaryWidthsFt: [16 / 12], materialIds: ['sawn-spruce-pine-fir-no1-no2'], repetitive: true, selfWeight: false })).rows[0].cells[0].spanText;
 * Reference: AWC Design Aid No. 6 (2007) case 1; NDS 2018 §§3.3–3.5, 3.10; ASCE 7-16/7-22 §2.4.1.
 */
export function buildSpanTable(input: SpanTableInput): SpanTableResult {
  const conditions = serviceConditions(input);
  const support = supportSpec(input).spec;
  const combinations: readonly LoadCombination[] = asdCombinations(input.edition);
  const psfByType: Record<LoadType, number> = {
    D: input.deadPsf,
    L: input.livePsf ?? 0,
    Lr: input.roofLivePsf ?? 0,
    S: input.roofSnowPsf ?? 0,
  };
  const active = combinations.filter((c) =>
    (Object.keys(c.factors) as LoadType[]).every((t) => t === 'D' || psfByType[t] > 0),
  );
  const selfWeight = input.selfWeight ?? true;
  if (!selfWeight && psfByType.D + psfByType.L + psfByType.Lr + psfByType.S <= 0) {
    throw new CalcInputError('deadPsf', 'Give a load above 0 psf, or include the self-weight');
  }
  const bearingIn = input.bearingIn ?? DEFAULT_BEARING_IN;
  const spanBasis = input.spanBasis ?? 'clear';
  const spanHeading =
    spanBasis === 'clear'
      ? `Clear spans: between the faces of the supports (the design span less ${bearingIn} in of bearing, half at each end)`
      : 'Design spans: support centre to support centre';
  const warnings: string[] = [];
  const rows: SpanTableResult['rows'] = [];
  const plies = [...new Set(input.plies ?? [1, 2, 3, 4])];
  const preset = DEFLECTION_PRESETS[input.deflectionUse ?? 'floor'];
  const materialIds = [...new Set(input.materialIds)];
  let sizeCount = 0;
  for (const materialId of materialIds) sizeCount += listSizes(materialId, { plies }).length;
  const layout = input.layout ?? 'simple';
  const overhangFraction = input.overhangFraction ?? DEFAULT_OVERHANG_FRACTION;
  const unit = layout === 'simple' ? null : patternedLayout(layout, overhangFraction, active);
  const combinationCount = unit ? unit.combinations.length : active.length;
  const work = sizeCount * input.tributaryWidthsFt.length * Math.max(1, combinationCount);
  if (work > CALC_BOUNDS.spanTableWork) {
    throw new CalcInputError(
      'materialIds',
      `This span table asks for ${work.toLocaleString('en-US')} checks (${sizeCount} sizes × ${input.tributaryWidthsFt.length} tributary widths × ${combinationCount} load combinations); at most ${CALC_BOUNDS.spanTableWork.toLocaleString('en-US')} per request: choose fewer materials, ply counts or widths`,
    );
  }

  for (const materialId of materialIds) {
    const material = getMaterial(materialId);
    if (material.generic)
      warnings.push(`${material.label}: generic values, confirm with the manufacturer's published values.`);
    for (const size of listSizes(materialId, { plies })) {
      let section;
      try {
        section = sectionFactors(materialId, size, LOOKUP_SPAN_FT, conditions);
      } catch (error) {
        if (!(error instanceof CalcInputError)) throw error;
        warnings.push(`${material.label} ${size.label}: ${error.message}`);
        continue;
      }
      const cells = input.tributaryWidthsFt.map((tributaryFt) => {
        const spanCase: UniformSpanCase = {
          wPlfByType: {
            D: psfByType.D * tributaryFt,
            L: psfByType.L * tributaryFt,
            Lr: psfByType.Lr * tributaryFt,
            S: psfByType.S * tributaryFt,
          },
          combinations: active,
          selfWeightPlf: selfWeight ? size.selfWeightPlf : 0,
          preset,
          deflectionCapIn: input.deflectionCapIn ?? null,
          creepKcr: creepFactor(conditions.wetService),
          sustainedLiveFraction: input.sustainedLiveFraction ?? 0,
          shearAtD: input.shearAtD ?? true,
          bearingIn,
          support,
        };
        const limits = unit
          ? patternedSpanLimits(materialId, size, section, spanCase, unit)
          : uniformSpanLimits(materialId, size, section, spanCase);
        const clearSpanFt = Math.max(0, limits.spanFt - bearingIn / IN_PER_FT);
        return {
          tributaryFt,
          spanFt: limits.spanFt,
          spanText: formatSpanFtIn((spanBasis === 'clear' ? clearSpanFt : limits.spanFt) * IN_PER_FT),
          clearSpanFt,
          designSpanFt: limits.spanFt,
          governedBy: limits.governedBy,
          combination: limits.combination,
        };
      });
      rows.push({ materialId, materialLabel: material.label, sizeId: size.id, sizeLabel: size.label, cells });
    }
  }
  return {
    caution: CAUTION_TEXT,
    spanBasis,
    spanHeading,
    layout,
    tributaryWidthsFt: input.tributaryWidthsFt,
    rows,
    notes: [
      spanBasis === 'clear'
        ? 'Spans printed are clear spans, between the faces of the supports (what is measured on site); the design span, support centre to support centre, is the clear span plus half the bearing at each end.'
        : 'Spans printed are design spans, support centre to support centre; the clear span is the design span less half the bearing at each end.',
      'Printed spans are rounded down to the inch.',
      `Top edge braced along its length (C_L = 1.0); bearing ${bearingIn} in at each end; deflection ${preset.label}: L/${preset.liveRatio} variable, L/${preset.totalRatio} total with creep.`,
      'Uniform loads only: point loads and partial loads need a member check.',
      ...layoutNotes(layout, overhangFraction),
    ],
    warnings,
    sources: [
      'AWC Design Aid No. 6 beam formulas (simple span, uniform load)',
      'NDS 2018 §§3.3–3.5, 3.10',
      `${input.edition} §2.4.1 ASD load combinations`,
      preset.source,
    ],
  };
}
