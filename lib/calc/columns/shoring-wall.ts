import { CONSTRUCTION_LOAD_DURATION_FACTOR, wetServiceFactors } from '@/lib/calc/factors';
import { getSize, materialSpec, referenceValues } from '@/lib/calc/materials';
import type { FactorUse } from '@/lib/calc/types';
import { axialCapacity, type ColumnAxis, type ColumnAxisResult } from './axial-capacity';
import { requirePositive } from './input-guards';

const IN_PER_FT = 12;
/** Common stud layouts (in on centre), widest first (common practice). */
const LAYOUT_SPACINGS_IN = [24, 16, 12, 8] as const;

/** How buckling across the stud's thickness (in the plane of the wall) is restrained. */
export type ShoringWeakAxisBracing = 'none' | 'mid-height-blocking' | 'sheathing';

export interface ShoringWallInput {
  /** Load the temporary wall carries during the swap (plf along the wall). */
  loadPlf: number;
  /** Stud spacing on centre (in). */
  studSpacingIn: number;
  /** Stud length between the plates (ft); the floor-to-ceiling height is a conservative stand-in. */
  heightFt: number;
  /** Stud material id. */
  materialId: string;
  /** Stud size id, e.g. "2x4", "2x6". */
  studSizeId: string;
  /** Plate material id (its F_c⊥ carries the studs); default: the stud material. */
  plateMaterialId?: string;
  /** Default 'none': temporary walls usually have no sheathing. */
  weakAxisBracing?: ShoringWeakAxisBracing;
  /** Load duration factor; default 1.25 (construction load, NDS Table 2.3.2). */
  CD?: number;
}

export interface ShoringWallCheck {
  loadPerStudLb: number;
  /** Stud buckling capacity F'_c × A (lb). */
  columnCapacityLb: number;
  /** Plate crushing capacity F_c⊥ × stud end area (lb), C_b = 1.0. */
  plateBearingCapacityLb: number;
  capacityPerStudLb: number;
  governing: 'stud buckling' | 'plate bearing';
  ratio: number;
  pass: boolean;
  /** Largest spacing that works for this load (in), exact. */
  maxSpacingIn: number;
  /** Widest common layout (24, 16, 12, 8 in) that works; null when none does. */
  layoutSpacingIn: number | null;
  axes: ColumnAxisResult[];
  factors: FactorUse[];
  warnings: string[];
  cautions: string[];
  sources: string[];
}

const SHORING_CAUTIONS = [
  'The shoring itself may need an engineer’s design.',
  'Shoring loads go down to the floor below: carry them to the foundation, with posts or shores below, where that floor cannot take them.',
  'Top and bottom plates, the header plate bending between studs and bracing of the wall are not checked here.',
] as const;

/**
 * Temporary shoring wall: load per stud = w × s / 12; each stud a column pinned at both plates, buckling
 * across its depth over the full height and across its thickness over the full height, half of it with
 * blocking at mid-height, or not at all where sheathing braces it; during construction l_e/d ≤ 75. The
 * bottom plate's F_c⊥ under the stud end (C_b = 1.0; studs can sit near a plate end) is checked too.
 * @param input see ShoringWallInput (loadPlf in plf, studSpacingIn in in, heightFt in ft)
 * @returns load and capacity per stud (lb), ratio, the widest spacing that works (in), cautions
 * @throws CalcInputError for unknown material or size, or non-positive load, spacing or height
 * @example checkShoringWall({ loadPlf: 600, studSpacingIn: 16, heightFt: 8, materialId: 'sawn-spruce-pine-fir-no1-no2', studSizeId: '2x4', weakAxisBracing: 'mid-height-blocking' }).pass // true
 * Reference: NDS 2018 §3.7.1 (C_P, l_e/d ≤ 75 during construction), §3.10.2 (F_c⊥), Table 2.3.2 (C_D
 *   1.25 construction); DESIGN.md §8 (shoring caution).
 */
export function checkShoringWall(input: ShoringWallInput): ShoringWallCheck {
  requirePositive('loadPlf', input.loadPlf, 'Shoring load');
  requirePositive('studSpacingIn', input.studSpacingIn, 'Stud spacing');
  requirePositive('heightFt', input.heightFt, 'Wall height');
  const CD = input.CD ?? CONSTRUCTION_LOAD_DURATION_FACTOR;
  requirePositive('CD', CD, 'Load duration factor');
  const spec = materialSpec(input.materialId);
  const stud = getSize(input.materialId, input.studSizeId);
  const plateMaterialId = input.plateMaterialId ?? input.materialId;
  const plateSpec = materialSpec(plateMaterialId);
  const bracing = input.weakAxisBracing ?? 'none';

  const lengthIn = input.heightFt * IN_PER_FT;
  const axes: ColumnAxis[] = [{ axis: 'across-d', leIn: lengthIn, dIn: stud.dIn, Kf: 1 }];
  if (bracing !== 'sheathing') {
    axes.push({
      axis: 'across-b',
      leIn: bracing === 'mid-height-blocking' ? lengthIn / 2 : lengthIn,
      dIn: stud.bIn,
      Kf: 1,
    });
  }
  const column = axialCapacity({
    materialId: input.materialId,
    size: stud,
    axes,
    CD,
    wet: false,
    duringConstruction: true,
  });

  const plateFcPerpPsi =
    referenceValues(plateMaterialId, stud).FcPerpPsi * wetServiceFactors(plateMaterialId, stud, false).fcPerp;
  const plateBearingCapacityLb = plateFcPerpPsi * stud.areaIn2;
  const columnCapacityLb = column.withinSlendernessLimit ? column.capacityLb : 0;
  const capacityPerStudLb = Math.min(columnCapacityLb, plateBearingCapacityLb);
  const loadPerStudLb = (input.loadPlf * input.studSpacingIn) / IN_PER_FT;
  const ratio = capacityPerStudLb > 0 ? loadPerStudLb / capacityPerStudLb : Infinity;
  const maxSpacingIn = (capacityPerStudLb * IN_PER_FT) / input.loadPlf;

  const warnings: string[] = [];
  if (!column.withinSlendernessLimit) {
    warnings.push(
      'Stud slenderness l_e/d exceeds 75 (NDS 3.7.1.4, during construction): add mid-height blocking or use a deeper stud.',
    );
  }
  if (spec.material.generic || plateSpec.material.generic) {
    warnings.push("Generic values: confirm with the manufacturer's published values.");
  }
  const factors: FactorUse[] = [
    ...column.factors,
    { symbol: 'C_b', value: 1, note: 'plate bearing: studs may sit near a plate end, NDS 3.10.4' },
  ];

  return {
    loadPerStudLb,
    columnCapacityLb,
    plateBearingCapacityLb,
    capacityPerStudLb,
    governing: columnCapacityLb <= plateBearingCapacityLb ? 'stud buckling' : 'plate bearing',
    ratio,
    pass: ratio <= 1,
    maxSpacingIn,
    layoutSpacingIn: LAYOUT_SPACINGS_IN.find((s) => s <= maxSpacingIn) ?? null,
    axes: column.axes,
    factors,
    warnings,
    cautions: [...SHORING_CAUTIONS],
    sources: [
      'NDS 2018 §3.7.1 column stability (l_e/d ≤ 75 during construction)',
      'NDS 2018 §3.10.2 bearing perpendicular to grain',
      'NDS 2018 Table 2.3.2 load duration (construction 1.25)',
      `${spec.material.source} reference values`,
    ],
  };
}
