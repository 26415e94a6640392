import type { PreparedMember } from '@/lib/calc/checks/prepare-member';
import type { TakedownLine } from '@/lib/calc/loads';
import { LOAD_TYPES, type LoadType } from '@/lib/calc/types';
import { formatNumberTrimmed as n } from '@/lib/format/number';

/** A point load on the member: it needs its own shore or post, it is not in the shoring walls' plf. */
export interface ShoringPointLoad {
  label: string;
  /** Position from the face of the left support (ft), as entered. */
  atFt: number;
  /** Sum of its loads of every type, unfactored (lb): an upper bound on any ASD combination. */
  totalLb: number;
  /** "400 lb D + 800 lb L". */
  expression: string;
}

/** The line load the temporary walls carry during the swap, with each step of its derivation. */
export interface ShoringLineLoad {
  /** The member's uniform takedown lines (plf by load type), as the member check lists them. */
  lines: TakedownLine[];
  /** Sum of the uniform lines by load type (plf); partial loads count at full intensity. */
  totalsPlf: Record<LoadType, number>;
  /** The ASD combination that gives the largest line load, e.g. "D + L". */
  combination: string;
  /** "1 × 72 + 1 × 240 = 312 plf". */
  expression: string;
  /** The largest combined line load (plf). */
  wPlf: number;
  /** True when a uniform load covers only part of the span (counted over the whole wall: upper bound). */
  hasPartialLoads: boolean;
  pointLoads: ShoringPointLoad[];
}

/**
 * The member's line load during the swap: its uniform takedown lines summed by load type, then the edition's
 * ASD combinations; the largest governs. Occupancy live load is taken in full (conservative: the house is
 * often lived in and the crew and materials stand on the floor above). Point loads are listed apart with
 * their unfactored sum; the member's own weight is left out (the new member goes in after the shoring).
 *
 * @param prepared the member prepared by prepareMember (loads in plf and lb, positions in ft)
 * @returns plf by load type, the governing combination and its plf, and the point loads (lb, ft)
 * @example shoringLineLoad(prepareMember(input)).wPlf // 312 for 72 plf D and 240 plf L
 * Reference: ASCE 7-16 / 7-22 §2.4.1 ASD combinations, Table 4.3-1 live loads.
 */
export function shoringLineLoad(prepared: PreparedMember): ShoringLineLoad {
  const lines = prepared.takedown.filter((line) => line.wPlf !== undefined);
  const totalsPlf: Record<LoadType, number> = { D: 0, L: 0, Lr: 0, S: 0 };
  for (const line of lines) totalsPlf[line.type] += line.wPlf ?? 0;

  let best = { combination: 'D', wPlf: 0, terms: [] as string[] };
  for (const { combination } of prepared.combinations) {
    const terms: string[] = [];
    let wPlf = 0;
    for (const type of LOAD_TYPES) {
      const factor = combination.factors[type];
      if (factor === undefined || totalsPlf[type] === 0) continue;
      wPlf += factor * totalsPlf[type];
      terms.push(`${n(factor, 3)} × ${n(totalsPlf[type], 1)} plf ${type}`);
    }
    if (wPlf > best.wPlf) best = { combination: combination.name, wPlf, terms };
  }

  const offsetFt = prepared.geometry.positionOffsetFt;
  const points = new Map<string, ShoringPointLoad>();
  for (const line of prepared.takedown) {
    if (line.pLb === undefined || line.atFt === undefined) continue;
    const key = `${line.label}@${line.atFt}`;
    const term = `${n(line.pLb, 0)} lb ${line.type}`;
    const found = points.get(key);
    if (found) {
      found.totalLb += line.pLb;
      found.expression += ` + ${term}`;
    } else {
      points.set(key, {
        label: line.label,
        atFt: Math.max(0, line.atFt - offsetFt),
        totalLb: line.pLb,
        expression: term,
      });
    }
  }

  return {
    lines,
    totalsPlf,
    combination: best.combination,
    expression: `${best.terms.join(' + ')} = ${n(best.wPlf, 1)} plf`,
    wPlf: best.wPlf,
    hasPartialLoads: lines.some((line) => line.startFt !== undefined),
    pointLoads: [...points.values()],
  };
}
