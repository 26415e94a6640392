import { unknownGradeMaterial } from '@/lib/calc/checks';
import { checkColumn, type ColumnInput } from '@/lib/calc/columns';
import { getSize, type MemberSize } from '@/lib/calc/materials';
import type { ElementCheck, LoadPathElementData, TypedLoad } from '@/shared/schemas/calc/load-path';
import type { LoadStandard } from '@/shared/schemas/jobs';
import { addLoads, combineLoad, governingLoad } from './typed-load';

type Vertical = Extract<LoadPathElementData, { kind: 'wall' | 'post' | 'steel-column' | 'pier' }>;

export interface VerticalElementCheck {
  /** What the element passes down at its bottom, by type (lb): what lands on it plus its own weight. */
  down: Record<string, number>;
  checks: ElementCheck[];
  engineerReasons: string[];
  assumptions: string[];
  warnings: string[];
}

/** A measured post: the catalogue size's section with the measured width and depth (self-weight pro rata). */
function measuredSize(size: MemberSize, bIn: number, dIn: number): MemberSize {
  const areaIn2 = bIn * dIn;
  return {
    ...size,
    id: `${size.id}-measured`,
    label: `${bIn} × ${dIn} in (measured)`,
    plies: 1,
    bIn,
    dIn,
    areaIn2,
    sxIn3: (bIn * dIn * dIn) / 6,
    ixIn4: (bIn * dIn ** 3) / 12,
    selfWeightPlf: (size.selfWeightPlf * areaIn2) / size.areaIn2,
  };
}

/** The column check of every combination that applies; the one with the largest ratio governs. */
function columnCheck(
  label: string,
  column: Omit<ColumnInput, 'loadLb' | 'CD'>,
  load: TypedLoad,
  edition: LoadStandard,
): { check: ElementCheck; warnings: string[] } {
  let best: { check: ElementCheck; warnings: string[] } | null = null;
  for (const c of combineLoad(load, edition)) {
    const result = checkColumn({ ...column, loadLb: Math.max(0, c.lb), CD: c.CD });
    if (best && result.ratio <= best.check.ratio) continue;
    best = {
      warnings: result.warnings,
      check: {
        label: `${label}: ${result.sizeLabel} in compression`,
        demand: result.fcPsi,
        capacity: result.FcPrimePsi,
        unit: 'psi',
        ratio: result.ratio,
        pass: result.pass,
        combination: c.combination,
        formula: `f_c = P/A = ${Math.round(c.lb)} lb / ${result.areaIn2.toFixed(2)} in² against F'_c (C_D ${c.CD}, C_P ${result.governingAxis.CPUsed.toFixed(3)})`,
      },
    };
  }
  return best as { check: ElementCheck; warnings: string[] };
}

/**
 * Checks an element that carries loads straight down: the jack studs of a wall (a built-up column braced
 * by the wall across its width), a wood post (its own weight added), a steel column against the capacity
 * rated for it, or a pier. A steel column without a rated capacity, and a brick or rubble pier, need an
 * engineer: Tributary does not check them.
 * @param element the element's data (heights ft, sizes in)
 * @param landing everything landing on it, by type (lb)
 * @param edition the job's load standard (the ASD combinations, C_D per combination)
 * @returns the load passed down by type (lb), the checks, and why an engineer is required if one is
 * @example checkVerticalElement({ kind: 'post', materialId: 'sawn-spruce-pine-fir-no1-no2', sizeId: '4x4', heightFt: 7.3 }, { D: 4800 }, 'ASCE 7-16').checks[0].ratio
 * Reference: NDS 2018 §3.7.1, §15.3 (built-up columns); HUD Residential Structural Design Guide (2000) Example 5.6.
 */
export function checkVerticalElement(
  element: Vertical,
  landing: TypedLoad,
  edition: LoadStandard,
): VerticalElementCheck {
  const out: VerticalElementCheck = {
    down: addLoads(landing),
    checks: [],
    engineerReasons: [],
    assumptions: [],
    warnings: [],
  };
  if (element.kind === 'wall') {
    const materialId = element.gradeUnknown
      ? unknownGradeMaterial(element.studMaterialId, element.studSizeId).id
      : element.studMaterialId;
    const sizeId =
      element.jackStuds === 1 ? element.studSizeId : `${element.jackStuds}-ply-${element.studSizeId}`;
    const { check, warnings } = columnCheck(
      `${element.jackStuds} jack stud${element.jackStuds === 1 ? '' : 's'}`,
      { materialId, sizeId, heightFt: element.heightFt, weakAxisBraced: true },
      landing,
      edition,
    );
    out.checks.push(check);
    out.warnings.push(...warnings);
    out.assumptions.push('Wall studs’ own weight not added (small beside the loads).');
    if (element.gradeUnknown)
      out.assumptions.push('Stud grade not read: the weakest grade of the species is used.');
  } else if (element.kind === 'post') {
    const materialId = element.gradeUnknown
      ? unknownGradeMaterial(element.materialId, element.sizeId).id
      : element.materialId;
    const catalogue = getSize(materialId, element.sizeId);
    const size = element.measured
      ? measuredSize(catalogue, element.measured.bIn, element.measured.dIn)
      : catalogue;
    out.down = addLoads(landing, { D: size.selfWeightPlf * element.heightFt });
    const { check, warnings } = columnCheck(
      'Post',
      { materialId, size, heightFt: element.heightFt, weakAxisBraced: element.weakAxisBraced },
      out.down,
      edition,
    );
    out.checks.push(check);
    out.warnings.push(...warnings);
    if (element.gradeUnknown)
      out.assumptions.push('Post grade not read: the weakest grade of the species is used.');
    if (element.measured) out.assumptions.push(`Post checked at its measured size ${size.label}.`);
  } else if (element.kind === 'steel-column') {
    const governing = governingLoad(landing, edition);
    out.assumptions.push('Steel column’s own weight not added.');
    if (element.ratedCapacityLb === undefined) {
      out.engineerReasons.push(
        'Steel column: Tributary does not check steel; an engineer confirms what it carries (or give the capacity rated for it).',
      );
    } else {
      const ratio = governing.lb / element.ratedCapacityLb;
      out.checks.push({
        label: 'Steel column against its rated capacity',
        demand: governing.lb,
        capacity: element.ratedCapacityLb,
        unit: 'lb',
        ratio,
        pass: ratio <= 1,
        combination: governing.combination,
        formula: 'P against the capacity rated for the column at its height (as given)',
      });
      out.assumptions.push('Steel column capacity as rated for it (given, not checked by Tributary).');
    }
  } else if (element.material === 'brick' || element.material === 'rubble') {
    out.engineerReasons.push(
      `A ${element.material} pier: its capacity and what it stands on cannot be judged from here; an engineer is required.`,
    );
  } else {
    out.assumptions.push(
      `A sound ${element.material === 'concrete' ? 'concrete' : 'concrete block'} pier is taken to carry the load down to what it stands on (common practice; confirm it is not cracked or undermined).`,
    );
  }
  return out;
}
