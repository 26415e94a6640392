import { IN3_PER_FT3 } from '@/lib/calc/analysis/simple-span';
import {
  combineStates,
  emptySpanState,
  stateMaxEiDeflection,
  stateMaxMoment,
  stateMaxShear,
} from '@/lib/calc/analysis/span-state';
import { LOAD_TYPES } from '@/lib/calc/types';
import type { CombinationDemands, SupportName } from '@/shared/schemas/calc/member';
import { endShearsFor, type PreparedMember } from './prepare-member';

const IN_PER_FT = 12;

/** Names of the supports, left to right, for a member on the given number of supports. */
export function supportNames(count: number): SupportName[] {
  return count === 3 ? ['left', 'centre', 'right'] : ['left', 'right'];
}

/**
 * The demands of every load combination that carries load, for one size: the support reactions of that
 * combination, the largest moment and shear with their positions, the design shear (at d from the supports
 * when asked, NDS 3.4.3.1) with the support it is next to, the variable-load (live) deflection, the plain
 * elastic total deflection and the total with creep (NDS 3.5.2), each with the position of its largest
 * value. Self-weight is included as dead load. Positions are ft along the design span from the left
 * support's centre; deflections in in, downward positive.
 *
 * @param prepared from prepareMember; selfWeightPlf the size's self-weight (plf, 0 when not included)
 * @param eiLbIn2 E'·I of the size (lb·in²); dIn its depth for shear at d (in)
 * @returns one entry per combination that is not skipped, in the edition's order
 * @example combinationDemands(prepared, 12.3, 1.6e6 * 98.9, 9.25)[0].maxMoment.lbFt;
 * Reference: AWC Design Aid No. 6 (2007) beam formulas; NDS 2018 §3.4.3.1 (shear at d), §3.5.2 (creep);
 * ASCE 7-16 / 7-22 §2.4.1.
 */
export function combinationDemands(
  prepared: PreparedMember,
  selfWeightPlf: number,
  eiLbIn2: number,
  dIn: number,
): CombinationDemands[] {
  const L = prepared.spans.designSpanFt;
  const toIn = IN3_PER_FT3 / eiLbIn2;
  const extra = prepared.creepKcr - 1;
  const dFt = (prepared.input.shearAtD ?? true) ? dIn / IN_PER_FT : 0;
  const shears = endShearsFor(prepared, dFt);
  const names = supportNames(2);
  const out: CombinationDemands[] = [];
  for (const prep of prepared.combinations) {
    if (prep.skipped) continue;
    const { factors, name, CD } = prep.combination;
    const sw = selfWeightPlf * (factors.D ?? 0);
    const elastic = combineStates(
      emptySpanState(L, prep.state.xs),
      [prep.state, prepared.unitSelfWeight],
      [1, sw],
    );
    const creep = combineStates(
      emptySpanState(L, prep.state.xs),
      [prep.state, prepared.deadState, prepared.liveState, prepared.unitSelfWeight],
      [1, extra, extra * prep.sustainedLiveFactor, sw * prepared.creepKcr],
    );
    const vEnds = [shears.unitSelfWeight[0] * sw, shears.unitSelfWeight[1] * sw];
    for (const t of LOAD_TYPES) {
      const f = factors[t] ?? 0;
      vEnds[0] += f * shears.byType[t][0];
      vEnds[1] += f * shears.byType[t][1];
    }
    const shearEnd = vEnds[1] > vEnds[0] ? 1 : 0;
    const moment = stateMaxMoment(elastic);
    const shear = stateMaxShear(elastic);
    const total = stateMaxEiDeflection(elastic);
    const totalCreep = stateMaxEiDeflection(creep);
    out.push({
      combination: name,
      CD,
      reactions: names.map((support, i) => ({
        support,
        atFt: i === 0 ? 0 : L,
        lb: elastic.reactionsLb[i],
      })),
      maxMoment: { lbFt: moment.value, atFt: moment.atFt },
      maxShear: { lb: shear.value, atFt: shear.atFt },
      designShear: {
        lb: vEnds[shearEnd],
        support: names[shearEnd],
        atD: dFt > 0,
      },
      deflectionLive: { in: prep.eiVariableDeflection.value * toIn, atFt: prep.eiVariableDeflection.atFt },
      deflectionTotalElastic: { in: total.value * toIn, atFt: total.atFt },
      deflectionTotal: { in: totalCreep.value * toIn, atFt: totalCreep.atFt },
    });
  }
  return out;
}
