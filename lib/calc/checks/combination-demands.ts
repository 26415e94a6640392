import { IN3_PER_FT3 } from '@/lib/calc/analysis/simple-span';
import {
  blankStateLike,
  combineStates,
  stateMaxEiDeflection,
  stateMaxMoment,
  stateMaxShear,
} from '@/lib/calc/analysis/span-state';
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
 * value. Self-weight is included as dead load. Positions are ft from the member's left end (the left
 * support's centre, or the tip of a left overhang); deflections in in, downward positive (an overhang's tip
 * may rise: negative).
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
  const toIn = IN3_PER_FT3 / eiLbIn2;
  const dFt = (prepared.input.shearAtD ?? true) ? dIn / IN_PER_FT : 0;
  const shears = endShearsFor(prepared, dFt);
  const { supportsFt } = prepared.geometry;
  const names = supportNames(supportsFt.length);
  const out: CombinationDemands[] = [];
  const elastic = blankStateLike(prepared.unitSelfWeight);
  const creep = blankStateLike(prepared.unitSelfWeight);
  for (const prep of prepared.combinations) {
    if (prep.skipped) continue;
    const { factors, name, CD } = prep.combination;
    const sw = selfWeightPlf * (factors.D ?? 0);
    combineStates(elastic, [prep.state, prepared.unitSelfWeight], [1, sw]);
    const creepCoeffs = prep.creepCoeffs;
    creepCoeffs[creepCoeffs.length - 1] = sw * prepared.creepKcr;
    combineStates(creep, prepared.groupAndUnitStates, creepCoeffs);
    let designShearLb = 0;
    let designSide = 0;
    for (let i = 0; i < shears.unitSelfWeight.length; i++) {
      let v = shears.unitSelfWeight[i] * sw;
      for (let g = 0; g < shears.byGroup.length; g++) v += prep.coeffs[g] * shears.byGroup[g][i];
      if (Math.abs(v) > designShearLb) {
        designShearLb = Math.abs(v);
        designSide = i;
      }
    }
    const moment = stateMaxMoment(elastic);
    const shear = stateMaxShear(elastic);
    const total = stateMaxEiDeflection(elastic);
    const totalCreep = stateMaxEiDeflection(creep);
    out.push({
      combination: name,
      CD,
      reactions: names.map((support, i) => ({ support, atFt: supportsFt[i], lb: elastic.reactionsLb[i] })),
      maxMoment: { lbFt: moment.value, atFt: moment.atFt },
      maxShear: { lb: shear.value, atFt: shear.atFt },
      designShear: {
        lb: designShearLb,
        support: names[shears.sideSupport[designSide]],
        atD: dFt > 0,
      },
      deflectionLive: { in: prep.eiVariableDeflection.value * toIn, atFt: prep.eiVariableDeflection.atFt },
      deflectionTotalElastic: { in: total.value * toIn, atFt: total.atFt },
      deflectionTotal: { in: totalCreep.value * toIn, atFt: totalCreep.atFt },
    });
  }
  return out;
}
