import type { ShoringSurface } from '@/shared/schemas/calc/shoring';
import { DEFAULT_JOIST_SPACING_IN } from '@/lib/calc/checks/mount-requirements';
import { formatNumberTrimmed as n } from '@/lib/format/number';
import { dressedLumber } from '@/tables/sections/dressed-lumber';
import { PRESUMPTIVE_SOIL_BEARING_PSF } from './footing-pad';
import { requirePositive } from './input-guards';

const IN_PER_FT = 12;
/** 2x planks laid flat that serve as mud sills, narrowest first (NDS Supplement Table 1B dressed widths). */
const SILL_PLANKS = dressedLumber.filter((row) => row.nominalThicknessIn === 2 && row.nominalWidthIn >= 6);

/**
 * - `spread-load`: the surface can take the wall once the load is spread on a sill (slab, ground);
 * - `check-floor-below`: the floor framing takes the load as point loads on its joists, not checked here;
 * - `not-acceptable`: the surface cannot take the wall as laid out.
 */
export type StandingVerdict = 'spread-load' | 'check-floor-below' | 'not-acceptable';

export interface StandingSurfaceInput {
  surface: ShoringSurface;
  /** Load on the temporary wall (plf). */
  wPlf: number;
  /** Floor joist spacing (in); default 16. */
  floorJoistSpacingIn?: number;
  /** Allowable soil bearing (psf); default 1,500 (IRC R401.4.1 presumptive value). */
  soilBearingPsf?: number;
}

export interface StandingSurfaceResult {
  surface: ShoringSurface;
  verdict: StandingVerdict;
  summary: string;
  /** What to do, in order. */
  actions: string[];
  /** Floor framing across the joists: point load on each joist the plate crosses = w × s / 12 (lb). */
  joistPointLoadLb: number | null;
  joistSpacingIn: number | null;
  /** Ground: sill width the soil needs = w / q (in). */
  requiredSillWidthIn: number | null;
  soilBearingPsf: number | null;
  /** Ground: the narrowest 2x plank laid flat that is wide enough ("2x8"); null when none is (cribbing). */
  sillPlank: string | null;
  sources: string[];
}

const SLAB_ACTIONS = [
  'Lay the bottom plate on a continuous sill (a 2x plank laid flat, or doubled plates) to spread the load.',
  'Keep the wall off cracks, slab edges and saw-cut joints; a post under a point load needs its own pad.',
] as const;

/**
 * What the temporary wall stands on, and what to do about it: a slab (thickness, reinforcement and cracks
 * unknown: spread the load), floor framing with the plate across the joists (w × s / 12 lb on each joist,
 * not checked here), floor framing with the plate along the joists (not acceptable without shoring below),
 * or ground (mud sill as wide as w / q, q = 1,500 psf presumptive unless given).
 * @param input surface, wPlf (plf), floorJoistSpacingIn (in), soilBearingPsf (psf)
 * @returns the verdict, the actions, the point load per joist (lb) or the sill width (in)
 * @throws CalcInputError for a non-positive load, joist spacing or soil bearing
 * @example standingSurface({ surface: 'ground', wPlf: 900 }).requiredSillWidthIn // 7.2
 * Reference: IRC 2021 R401.4.1 (presumptive soil bearing 1,500 psf); NDS Supplement 2018 Table 1B (dressed
 *   widths); common practice for slabs and floor framing.
 */
export function standingSurface(input: StandingSurfaceInput): StandingSurfaceResult {
  requirePositive('wPlf', input.wPlf, 'Wall load');
  const none = {
    surface: input.surface,
    joistPointLoadLb: null,
    joistSpacingIn: null,
    requiredSillWidthIn: null,
    soilBearingPsf: null,
    sillPlank: null,
  };
  switch (input.surface) {
    case 'slab-on-grade':
      return {
        ...none,
        verdict: 'spread-load',
        summary: 'Slab on grade: its thickness, reinforcement and cracks are unknown and not checked here.',
        actions: [...SLAB_ACTIONS],
        sources: ['Common practice (slab bearing not checked)'],
      };
    case 'basement-slab':
      return {
        ...none,
        verdict: 'spread-load',
        summary:
          'Basement slab: usually a slab on fill, not a footing (common practice); its thickness and cracks are unknown and not checked here.',
        actions: [...SLAB_ACTIONS],
        sources: ['Common practice (slab bearing not checked)'],
      };
    case 'floor-framing-perpendicular': {
      const spacingIn = input.floorJoistSpacingIn ?? DEFAULT_JOIST_SPACING_IN;
      requirePositive('floorJoistSpacingIn', spacingIn, 'Floor joist spacing');
      const pointLb = (input.wPlf * spacingIn) / IN_PER_FT;
      return {
        ...none,
        verdict: 'check-floor-below',
        summary:
          `Floor framing, plate across the joists: each joist takes a point load of ${n(pointLb, 0)} lb ` +
          `(${n(input.wPlf, 1)} plf × ${n(spacingIn, 2)} in ÷ 12) where the wall crosses it; not checked here.`,
        actions: [
          'Have the joists below checked for that point load, or shore under the temporary wall.',
          'Shores below (a wall or posts under the temporary wall) go down to the foundation or a footing.',
        ],
        joistPointLoadLb: pointLb,
        joistSpacingIn: spacingIn,
        sources: ['Common practice (joists below not checked)'],
      };
    }
    case 'floor-framing-parallel':
      return {
        ...none,
        verdict: 'not-acceptable',
        summary:
          'Floor framing, plate along the joists: the plate sits on one joist or on the subfloor between joists, which cannot carry the wall.',
        actions: [
          'Turn the wall to cross the joists, or shore under it (a wall or posts) down to the foundation.',
        ],
        sources: ['Common practice'],
      };
    case 'ground': {
      const soilBearingPsf = input.soilBearingPsf ?? PRESUMPTIVE_SOIL_BEARING_PSF;
      requirePositive('soilBearingPsf', soilBearingPsf, 'Soil bearing');
      const widthIn = (input.wPlf / soilBearingPsf) * IN_PER_FT;
      const plank = SILL_PLANKS.find((row) => row.dIn >= widthIn) ?? null;
      const soilText =
        input.soilBearingPsf === undefined
          ? `${n(soilBearingPsf, 0)} psf, the IRC presumptive value where the soil is not known`
          : `${n(soilBearingPsf, 0)} psf`;
      return {
        ...none,
        verdict: 'spread-load',
        summary: `Ground: a mud sill at least ${n(widthIn, 1)} in wide (${n(input.wPlf, 1)} plf ÷ ${soilText} × 12 in/ft).`,
        actions: [
          plank
            ? `Lay a ${plank.nominal} mud sill flat (${plank.dIn} in wide) under the bottom plate, on firm, level, undisturbed soil.`
            : 'No 2x plank is wide enough: set the wall on cribbing or a wider footing, on firm, level, undisturbed soil.',
          'Clear mud, loose fill and topsoil from under the sill; keep water away from it.',
        ],
        requiredSillWidthIn: widthIn,
        soilBearingPsf,
        sillPlank: plank?.nominal ?? null,
        sources: [
          'IRC 2021 R401.4.1 presumptive load-bearing values of soils',
          'NDS Supplement 2018 Table 1B dressed sizes',
        ],
      };
    }
  }
}
