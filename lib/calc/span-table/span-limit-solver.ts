import { GLULAM_VOLUME_REFERENCE } from '@/lib/calc/factors';
import { materialSpec, type MemberSize } from '@/lib/calc/materials';
import type { LoadCombination } from '@/lib/calc/types';
import type { CheckId } from '@/shared/schemas/calc/member';
import type { SectionFactors } from '@/lib/calc/checks/section-factors';
import type { UniformSpanCase, UniformSpanLimits } from './uniform-span-limits';

const IN_PER_FT = 12;

/**
 * What every closed-form span-limit solver (simple span, two spans, overhang) shares for one size: the size's
 * E'·I, the depth for shear at d, the bearing capacity per inch of bearing, a tally of each check's least span
 * with its combination, and the bending limit (glulam with its volume factor over the span).
 */
export interface SpanLimitSolver {
  /** E'·I of the size, lb·in². */
  eiLbIn2: number;
  /** d for shear at d from the supports, ft (0 when shear is taken at the supports). */
  dFt: number;
  /** Reaction one inch of bearing carries, lb: the lesser of the member and the plate under it. */
  bearingLbPerIn: number;
  /** Keeps `spanFt` (ft) for check `id` when it is the least so far, with its combination. */
  take(id: CheckId, spanFt: number, combination: string): void;
  /**
   * Keeps the bending span of combination `c`, given the span (ft) at which its moment reaches F_b·S for a
   * bending stress F_b (psi): C_D applied, the size factor where C_V and C_L are not combined, glulam's C_V
   * solved over the span.
   */
  takeBending(c: LoadCombination, spanAtFbFt: (FbPsi: number) => number): void;
  /** Each check's least span (ft), the governing one and its combination. */
  result(): UniformSpanLimits;
}

/**
 * The shared part of the span-limit solvers for one size and load case.
 *
 * @param materialId material; size member size (in); section its factors (in, psi) from sectionFactors
 * @param spanCase loads (plf), limits and the support (in, psi)
 * @returns the solver's basis and tally (lb·in², ft, lb per in)
 * @example const s = spanLimitSolver(id, size, section, spanCase); s.take('shear', 14.2, 'D + L'); s.result().spanFt; // 14.2
 * Reference: NDS 2018 §3.3 (bending, C_L = 1.0 braced), §3.4.3.1 (shear at d), §3.10 (bearing), §5.3.6
 * (glulam volume factor).
 */
export function spanLimitSolver(
  materialId: string,
  size: MemberSize,
  section: SectionFactors,
  spanCase: UniformSpanCase,
): SpanLimitSolver {
  const { support } = spanCase;
  const spec = materialSpec(materialId);
  const byCheck: Record<CheckId, number> = {
    bending: Infinity,
    shear: Infinity,
    'deflection-live': Infinity,
    'deflection-total': Infinity,
    bearing: Infinity,
  };
  const combos: Record<CheckId, string> = {
    bending: '',
    shear: '',
    'deflection-live': '',
    'deflection-total': '',
    bearing: '',
  };
  const take = (id: CheckId, spanFt: number, name: string) => {
    if (spanFt < byCheck[id]) {
      byCheck[id] = spanFt;
      combos[id] = name;
    }
  };
  return {
    eiLbIn2: section.EPrimePsi * section.ixIn4,
    dFt: spanCase.shearAtD ? section.dIn / IN_PER_FT : 0,
    bearingLbPerIn: Math.min(
      Math.min(section.bIn, support.widthIn) * section.FcPerpPrimePsi,
      support.plateFcPerpPsi === null ? Infinity : support.widthIn * support.plateFcPerpPsi,
    ),
    take,
    takeBending(c, spanAtFbFt) {
      const FbNoCv = section.FbBasePsi * c.CD;
      if (spec.family === 'glulam') {
        const exponent = GLULAM_VOLUME_REFERENCE.exponent[spec.stressClass.speciesGroup];
        take('bending', glulamBendingSpan(spanAtFbFt(FbNoCv), size, exponent), c.name);
      } else {
        // C_L = 1.0 here, so where C_V and C_L are not combined (LVL with C_V ≤ 1.0) the lesser is C_V.
        take(
          'bending',
          spanAtFbFt(FbNoCv * (section.volumeLesserOfCL ? section.sizeFactor.value : 1)),
          c.name,
        );
      }
    },
    result() {
      let governedBy: CheckId = 'bending';
      for (const id of Object.keys(byCheck) as CheckId[])
        if (byCheck[id] < byCheck[governedBy]) governedBy = id;
      return { byCheck, spanFt: byCheck[governedBy], governedBy, combination: combos[governedBy] };
    },
  };
}

/**
 * Largest glulam bending span, ft, in closed form (any layout whose moment grows as the span squared). With C_V = (A/L)^e ≤ 1, A = 21 ft·(12/d)(5.125/b),
 * e = 1/10 western or 1/20 Southern Pine (NDS 2018 eq. 5.3-1): the span without C_V is L₀ = √(8·S·F_b/w);
 * if L₀ ≤ A then C_V = 1 there and L₀ is the span, else w·L²/(8S) = F_b·(A/L)^e gives
 * L = (L₀²·A^e)^(1/(2 + e)).
 * @param spanWithoutCvFt the bending span with C_V = 1, ft; size the glulam size (in); exponent e
 * @example glulamBendingSpan(30, getSize('glulam-24f-v4-df', '5.125x12'), 0.1); // < 30
 * Reference: NDS 2018 §5.3.6, equation 5.3-1.
 */
export function glulamBendingSpan(spanWithoutCvFt: number, size: MemberSize, exponent: number): number {
  const ref = GLULAM_VOLUME_REFERENCE;
  const bIn = Math.min(size.bIn, ref.maxWidthIn);
  const aFt = ref.lengthFt * (ref.depthIn / size.dIn) * (ref.widthIn / bIn);
  if (spanWithoutCvFt <= aFt) return spanWithoutCvFt;
  return Math.pow(spanWithoutCvFt * spanWithoutCvFt * Math.pow(aFt, exponent), 1 / (2 + exponent));
}
