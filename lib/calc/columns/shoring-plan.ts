import { prepareMember } from '@/lib/calc/checks/prepare-member';
import { materialSpec } from '@/lib/calc/materials';
import { CAUTION_TEXT } from '@/lib/calc/prescriptive/caution';
import { CalcInputError } from '@/lib/calc/types';
import { formatNumberTrimmed as n } from '@/lib/format/number';
import { DEFAULT_SHORING_SETBACK_FT, type ShoringPlanInput } from '@/shared/schemas/calc/shoring';
import { requirePositive } from './input-guards';
import { shoringLineLoad, type ShoringLineLoad } from './shoring-load';
import { checkShoringWall, type ShoringWallCheck } from './shoring-wall';
import { standingSurface, type StandingSurfaceResult } from './standing-surface';

/** One step of a wall's load: a line load (plf) or a dimensionless factor. */
export interface ShoringLine {
  label: string;
  expression: string;
  value: number;
  unit: 'plf' | '';
}

export interface ShoringWallPlan {
  side: 'A' | 'B';
  /** Line load on this wall (plf). */
  loadPlf: number;
  /** Its derivation from the member's line load, step by step. */
  lines: ShoringLine[];
  check: ShoringWallCheck;
  standing: StandingSurfaceResult;
}

export interface ShoringPlan {
  caution: string;
  /** The member's line load during the swap (plf) and its point loads (lb). */
  load: ShoringLineLoad;
  /** How the load is shared: by the joist spans each side, or the whole load on each wall. */
  shareBasis: ShareBasis;
  setbackFt: number;
  walls: ShoringWallPlan[];
  /** Every wall's studs and plate pass and no wall stands on a surface that cannot take it. */
  pass: boolean;
  /** Assumptions and site notes (live load, share, clearance). */
  notes: string[];
  warnings: string[];
  cautions: string[];
  sources: string[];
}

/** Runs `run`, re-raising an engine input error under the plan's field name. */
function underField<T>(prefix: string, run: () => T, rename: Record<string, string> = {}): T {
  try {
    return run();
  } catch (error) {
    if (error instanceof CalcInputError) {
      throw new CalcInputError(`${prefix}.${rename[error.field] ?? error.field}`, error.message);
    }
    throw error;
  }
}

type ShareBasis = 'joist-spans' | 'whole-load-each';

interface Shares {
  basis: ShareBasis;
  /** Per wall, the factors on the member's line load (share of the span, setback lever). */
  walls: { side: 'A' | 'B'; lines: ShoringLine[] }[];
}

/** Setback lever: joists of span L that now bear c short of their end put L / (L − c) of their end load on the wall. */
function leverLine(side: 'A' | 'B', spanFt: number, setbackFt: number): ShoringLine {
  return {
    label: `Setback lever, side ${side}`,
    expression: `${n(spanFt, 2)} ft ÷ (${n(spanFt, 2)} − ${n(setbackFt, 2)}) ft (joists overhang the temporary wall)`,
    value: spanFt / (spanFt - setbackFt),
    unit: '',
  };
}

function shares(input: ShoringPlanInput, setbackFt: number): Shares {
  const spanA = input.joistSpanAFt;
  const spanB = input.joistSpanBFt;
  for (const [field, spanFt] of [
    ['joistSpanAFt', spanA],
    ['joistSpanBFt', spanB],
  ] as const) {
    if (spanFt === undefined) continue;
    requirePositive(field, spanFt, 'Joist span');
    if (setbackFt >= spanFt)
      throw new CalcInputError('setbackFt', 'The setback must be less than the joist span');
  }
  if (input.layout === 'one-side') {
    const lines = spanA === undefined ? [] : [leverLine('A', spanA, setbackFt)];
    return { basis: 'whole-load-each', walls: [{ side: 'A', lines }] };
  }
  if (spanA === undefined || spanB === undefined) {
    if (spanA !== undefined || spanB !== undefined) {
      throw new CalcInputError(
        spanA === undefined ? 'joistSpanAFt' : 'joistSpanBFt',
        'Give the joist span on both sides, or on neither',
      );
    }
    return { basis: 'whole-load-each', walls: (['A', 'B'] as const).map((side) => ({ side, lines: [] })) };
  }
  const walls = (
    [
      ['A', spanA],
      ['B', spanB],
    ] as const
  ).map(([side, spanFt]): Shares['walls'][number] => ({
    side,
    lines: [
      {
        label: `Share of side ${side}`,
        expression: `${n(spanFt, 2)} ft ÷ (${n(spanA, 2)} + ${n(spanB, 2)}) ft joist spans`,
        value: spanFt / (spanA + spanB),
        unit: '',
      },
      leverLine(side, spanFt, setbackFt),
    ],
  }));
  return { basis: 'joist-spans', walls };
}

/**
 * Plans the temporary walls for swapping a bearing wall or member: the member's line load during the swap
 * (its uniform takedown lines, the edition's ASD combinations, full occupancy live load), each wall's share
 * (by the joist spans each side when both are given, with the setback's lever L / (L − c) on the joists;
 * otherwise the whole load on each wall, since one may carry it all while the other is set), each wall's
 * studs checked as columns at C_D 1.25, and what each wall stands on. Point loads on the member are left out
 * of the walls' plf and listed: each needs its own shore or post.
 * @param input parsed shoringPlanInputSchema: member loading (ft, psf, plf, lb), joist spans and setback (ft),
 *   studs (spacing in, height ft), floor joist spacing (in), soil bearing (psf)
 * @returns the line load derivation (plf), each wall's load (plf), stud check and standing verdict, notes,
 *   warnings, cautions and sources
 * @throws CalcInputError naming the field ("member.sources.0.endFt", "studs.studSpacingIn", "setbackFt", ...)
 * @example planShoring(shoringPlanInputSchema.parse({ member, layout: 'both-sides', studs, standsOn: 'ground' })).walls[0].loadPlf
 * Reference: ASCE 7-16 / 7-22 §2.4.1 and Table 4.3-1; NDS 2018 §3.7.1 and Table 2.3.2 (C_D 1.25
 *   construction); AWC Design Aid No. 6 (beam overhanging one support); IRC 2021 R401.4.1; DESIGN.md §8.
 */
export function planShoring(input: ShoringPlanInput): ShoringPlan {
  const setbackFt = input.setbackFt ?? DEFAULT_SHORING_SETBACK_FT;
  requirePositive('setbackFt', setbackFt, 'Setback');
  const prepared = underField('member', () => prepareMember(input.member));
  const load = shoringLineLoad(prepared);
  if (load.wPlf <= 0) {
    throw new CalcInputError(
      'member.sources',
      'The member carries no line load: give at least one uniform load source (point loads need their own posts)',
    );
  }
  if (input.studs.plateMaterialId !== undefined) {
    const plateId = input.studs.plateMaterialId;
    underField('studs', () => materialSpec(plateId), { materialId: 'plateMaterialId' });
  }

  const wallShares = shares(input, setbackFt);
  const walls = wallShares.walls.map(({ side, lines: shareLines }): ShoringWallPlan => {
    const memberLine: ShoringLine = {
      label: `Member line load (${load.combination})`,
      expression: load.expression,
      value: load.wPlf,
      unit: 'plf',
    };
    const loadPlf = shareLines.reduce((w, line) => w * line.value, load.wPlf);
    const lines = [memberLine, ...shareLines];
    if (shareLines.length > 0) {
      lines.push({
        label: `Wall ${side}`,
        expression: [`${n(load.wPlf, 1)} plf`, ...shareLines.map((l) => n(l.value, 3))].join(' × '),
        value: loadPlf,
        unit: 'plf',
      });
    }
    const check = underField('studs', () => checkShoringWall({ ...input.studs, loadPlf }), {
      sizeId: 'studSizeId',
    });
    const standing = standingSurface({
      surface: input.standsOn,
      wPlf: loadPlf,
      floorJoistSpacingIn: input.floorJoistSpacingIn,
      soilBearingPsf: input.soilBearingPsf,
    });
    return { side, loadPlf, lines, check, standing };
  });

  const notes = [
    'Live load: the full occupancy live load of the member’s sources (conservative: the house is often lived in, and the crew and materials stand on the floor above), combined with roof live load and snow by the job’s ASD combinations; the largest governs.',
    wallShares.basis === 'joist-spans'
      ? 'Each wall takes the load of the joists on its side, in proportion to the joist spans; every line load on the member is taken to split the same way.'
      : 'Each wall is checked for the member’s whole line load: one wall may carry all of it while the other is being set or shimmed (conservative).',
    `Temporary walls stand clear of the work area on both sides, typically 2 to 3 ft back from the wall being removed (common practice); this plan uses ${n(setbackFt, 2)} ft.`,
    'Studs are checked at C_D 1.25 (construction load, NDS Table 2.3.2): the shoring stands for days, not years.',
    'The new member’s own weight is not included: it rests on its own supports, not on the temporary walls.',
  ];
  const warnings = [...prepared.warnings];
  if (load.hasPartialLoads) {
    warnings.push(
      'A partial line load is taken along the whole wall (upper bound): shore that stretch first.',
    );
  }
  if (input.layout === 'one-side') {
    warnings.push(
      'One temporary wall carries only the joists on its side, or joists continuous over the wall: where joists bear on the wall from both sides, set a wall on each side (common practice).',
    );
  }
  if (wallShares.walls.every((s) => s.lines.length === 0)) {
    warnings.push(
      `Without the joist span the setback’s lever is not counted: joists of span L bearing ${n(setbackFt, 2)} ft short of their end put L ÷ (L − ${n(setbackFt, 2)}) times their end load on the wall.`,
    );
  }
  for (const point of load.pointLoads) {
    warnings.push(
      `${point.label} at ${n(point.atFt, 2)} ft (${point.expression} = ${n(point.totalLb, 0)} lb): a point load needs its own shore or post under it, down to solid bearing; it is not in the walls’ plf.`,
    );
  }
  for (const wall of walls) {
    warnings.push(...wall.check.warnings.map((w) => `Wall ${wall.side}: ${w}`));
    if (wall.standing.verdict === 'not-acceptable')
      warnings.push(`Wall ${wall.side}: ${wall.standing.summary}`);
  }

  return {
    caution: CAUTION_TEXT,
    load,
    shareBasis: wallShares.basis,
    setbackFt,
    walls,
    pass: walls.every((w) => w.check.pass && w.standing.verdict !== 'not-acceptable'),
    notes,
    warnings: [...new Set(warnings)],
    cautions: walls[0].check.cautions,
    sources: [
      ...new Set([
        ...prepared.sources,
        'ASCE 7 Table 4.3-1 live loads (full occupancy live during the swap)',
        ...(wallShares.walls.some((w) => w.lines.length > 0)
          ? ['AWC Design Aid No. 6: beam overhanging one support (setback lever)']
          : []),
        ...walls.flatMap((w) => [...w.check.sources, ...w.standing.sources]),
      ]),
    ],
  };
}
