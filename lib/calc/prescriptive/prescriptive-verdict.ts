import { serviceConditions, supportSpec } from '@/lib/calc/checks/check-member';
import { evaluateSize } from '@/lib/calc/checks/evaluate-size';
import { prepareMember } from '@/lib/calc/checks/prepare-member';
import { sectionFactors } from '@/lib/calc/checks/section-factors';
import { listSizes, thicknessClass } from '@/lib/calc/materials';
import type { PrescriptiveInput, PrescriptiveResult } from '@/shared/schemas/calc/member';
import { CAUTION_TEXT } from './caution';
import { envelopeReasons } from './envelope';

/** Plies a 2x header is built from in code tables (from memory: single to quadruple 2x). */
const HEADER_PLIES = [1, 2, 3, 4];

/**
 * Whether a header likely sits inside what the adopted code's header tables cover. Inside: "Likely covered
 * by your adopted code's header table — check it there", beside Tributary's own smallest sawn 2x header of
 * the member's material for the same loads (shallowest, then lightest, that passes every check). Outside:
 * "Engineer needed because …" with every reason (including when no sawn 2x header of the material passes
 * Tributary's own check). The code table itself is never reproduced.
 *
 * @param input parsed prescriptiveInputSchema: member input (ft, in, psf), building width ft, ground snow psf
 * @returns verdict, message, reasons, Tributary's computed header and the caution
 * @example prescriptiveVerdict(prescriptiveInputSchema.parse({ member, buildingWidthFt: 28, groundSnowPsf: 30 })).verdict;
 * Reference: IRC 2021 R602.7 and Tables R602.7(1), R602.7(2) (scope only); NDS 2018 for the computed size.
 */
export function prescriptiveVerdict(input: PrescriptiveInput): PrescriptiveResult {
  const reasons = envelopeReasons(input);
  const notes: string[] = [
    "Header tables assume their own dead and live loads, grades and jack stud counts: read the table's footnotes.",
    'Where the top of the header is not braced, the tables reduce the span (IRC R602.7 footnote: 0.70).',
  ];
  const engineerNeeded = (why: string[]): PrescriptiveResult => ({
    caution: CAUTION_TEXT,
    verdict: 'engineer-needed',
    message: `Engineer needed because ${why.join('; ')}.`,
    reasons: why,
    computed: null,
    notes,
  });
  if (reasons.length > 0) return engineerNeeded(reasons);
  const { member } = input;
  const prepared = prepareMember(member);
  const conditions = serviceConditions(member);
  const support = supportSpec(member).spec;
  let best: PrescriptiveResult['computed'] = null;
  let bestKey = [Infinity, Infinity];
  for (const size of listSizes(member.materialId, { plies: HEADER_PLIES })) {
    if (thicknessClass(size) !== 'two-three') continue;
    const evaluation = evaluateSize(
      prepared,
      sectionFactors(member.materialId, size, prepared.geometry.longestSpanFt, conditions),
      size.selfWeightPlf,
      support,
    );
    const key = [size.dIn, size.selfWeightPlf];
    if (evaluation.pass && (key[0] < bestKey[0] || (key[0] === bestKey[0] && key[1] < bestKey[1]))) {
      bestKey = key;
      best = {
        materialId: member.materialId,
        sizeId: size.id,
        sizeLabel: size.label,
        utilization: evaluation.governing.ratio,
        governingCheck: evaluation.governing.id,
      };
    }
  }
  if (!best)
    return engineerNeeded([
      "no sawn 2x header of this material passes Tributary's own check for these loads",
    ]);
  return {
    caution: CAUTION_TEXT,
    verdict: 'likely-covered',
    message: `Likely covered by your adopted code's header table — check it there. Tributary's own check for the same loads: ${best.sizeLabel}.`,
    reasons,
    computed: best,
    notes,
  };
}
