import { checkMember } from '@/lib/calc/checks';
import { LOAD_TYPES, CalcInputError } from '@/lib/calc/types';
import { CALC_BOUNDS } from '@/shared/schemas/calc/bounds';
import type { LoadPathEnd, TypedLoad } from '@/shared/schemas/calc/load-path';
import type { LoadSource } from '@/shared/schemas/calc/loads';
import type { MemberCheckInput, MemberCheckResult } from '@/shared/schemas/calc/member';
import { zeroLoad } from './typed-load';

/** A load landing on a beam from an end above it. */
export interface LandingLoad {
  fromId: string;
  fromLabel: string;
  fromEnd: LoadPathEnd;
  /** ft from the face of the beam's left support (as its point sources). */
  atFt: number;
  load: TypedLoad;
}

export interface BeamElementCheck {
  result: MemberCheckResult;
  /** What each support passes down, unfactored by type (lb), self-weight included. */
  endLoads: Partial<Record<LoadPathEnd, Record<string, number>>>;
  warnings: string[];
  assumptions: string[];
}

/** A load from above as a point source on the beam, by type; uplift (a negative part) is not carried. */
function pointSource(landing: LandingLoad): { source: LoadSource; uplift: boolean } {
  const part = (lb: number | undefined) => Math.max(0, lb ?? 0);
  const uplift = LOAD_TYPES.some((t) => (landing.load[t] ?? 0) < 0);
  return {
    uplift,
    source: {
      kind: 'point',
      pointKind: 'post-above',
      label: `From ${landing.fromLabel} (${landing.fromEnd})`,
      flag: 'assumed',
      atFt: landing.atFt,
      deadLb: part(landing.load.D),
      liveLb: part(landing.load.L),
      roofLiveLb: part(landing.load.Lr),
      snowLb: part(landing.load.S),
    },
  };
}

/**
 * Checks a beam, girder or joist under its own loads plus the loads landing on it, with the engine's member
 * check (no second beam analysis): each landing load becomes a point source at its position, by load type,
 * so the member's own ASD combinations (and span-by-span live placement on a continuous member) apply to it.
 * The loads each support passes down are the member's unfactored reactions by type, self-weight included.
 * @param input the beam's check input (ft, in, psf, plf, lb)
 * @param landing loads from above (lb by type, position in ft from the left support's face)
 * @param bearingField how to name a landing load's position in an error ("post-1.bearings.bottom")
 * @returns the member result, the load per support by type (lb), warnings and assumption notes
 * @throws CalcInputError for a landing load off the member or too many loads on it
 * @example checkBeamElement(girderInput, [{ fromId: 'p1', fromLabel: 'Post', fromEnd: 'bottom', atFt: 7, load: { D: 900, L: 2400 } }], (i) => 'p1.bearings.bottom').result.pass
 * Reference: AWC Design Aid No. 6 (superposition of point loads); ASCE 7 §2.4.1; NDS 2018 §§3.3–3.5, 3.10.
 */
export function checkBeamElement(
  input: MemberCheckInput,
  landing: readonly LandingLoad[],
  bearingField: (index: number) => string,
): BeamElementCheck {
  const warnings: string[] = [];
  if (input.sources.length + landing.length > CALC_BOUNDS.sources) {
    throw new CalcInputError(
      bearingField(0),
      `At most ${CALC_BOUNDS.sources} loads on one member, its own and those landing on it`,
    );
  }
  const points = landing.map(pointSource);
  if (points.some((p) => p.uplift)) {
    warnings.push('A load from above lifts at its end: the uplift is not carried down; hold that end down.');
  }
  const own = input.sources.length;
  let result: MemberCheckResult;
  try {
    result = checkMember({ ...input, sources: [...input.sources, ...points.map((p) => p.source)] });
  } catch (error) {
    const index = error instanceof CalcInputError ? /^sources\.(\d+)/.exec(error.field) : null;
    if (index && Number(index[1]) >= own) {
      throw new CalcInputError(
        `${bearingField(Number(index[1]) - own)}.atFt`,
        error instanceof Error ? error.message : '',
      );
    }
    throw error;
  }
  const endLoads: BeamElementCheck['endLoads'] = {};
  for (const [end, key] of [
    ['left', 'leftLb'],
    ['right', 'rightLb'],
    ['centre', 'centreLb'],
  ] as const) {
    if (end === 'centre' && input.secondClearSpanFt === undefined) continue;
    const load: Record<string, number> = zeroLoad();
    for (const t of LOAD_TYPES) load[t] = result.reactions.byType[t]?.[key] ?? 0;
    endLoads[end] = load;
  }
  if (input.secondClearSpanFt !== undefined || input.overhangLeftFt || input.overhangRightFt) {
    warnings.push(
      'Loads go down by type with every load on every span; placing live load span by span can raise one support’s reaction above that (the member’s own check covers it, the chain below takes the full-load value).',
    );
  }
  const assumptions = result.inputs
    .filter((i) => i.flag === 'assumed')
    .map(
      (i) =>
        `${result.member.label ?? 'Member'}: ${i.label} ${i.value}${i.unit ? ` ${i.unit}` : ''} (assumed)`,
    );
  if (input.gradeUnknown) {
    assumptions.push(
      `${input.label ?? 'Member'}: grade stamp not read — the weakest grade of the species is used`,
    );
  }
  if (input.measuredPly) {
    assumptions.push(
      `${input.label ?? 'Member'}: checked at its measured size ${input.measuredPly.bIn} × ${input.measuredPly.dIn} in`,
    );
  }
  return { result, endLoads, warnings: [...warnings, ...result.warnings], assumptions };
}
