import { PRESUMPTIVE_SOIL_BEARING_PSF, sizeFootingPad } from '@/lib/calc/columns';
import type { ElementCheck, LoadPathElementData, TypedLoad } from '@/shared/schemas/calc/load-path';
import type { LoadStandard } from '@/shared/schemas/jobs';
import { governingLoad } from './typed-load';

type Ground = Extract<LoadPathElementData, { kind: 'footing' | 'foundation-wall' | 'slab' }>;

/** A new pad's thickness when none is given, in (common practice). */
export const DEFAULT_NEW_PAD_THICKNESS_IN = 12;
const IN2_PER_FT2 = 144;

export interface GroundElementCheck {
  checks: ElementCheck[];
  pad?: { sideIn: number; soilBearingPsf: number; loadLb: number };
  confirmed: boolean;
  engineerReasons: string[];
  openReasons: string[];
  assumptions: string[];
}

/**
 * Checks where a chain ends: an existing footing of measured size against the soil bearing, a new pad sized
 * at the soil bearing (the presumptive 1,500 psf unless given), a foundation wall, or a slab. An existing
 * footing of unknown size and a slab (not a footing) need an engineer. A chain ends here only once the user
 * has confirmed the footing or foundation wall.
 * @param element the element's data (sizes in, soil bearing psf)
 * @param landing everything landing on it, by type (lb)
 * @param edition the job's load standard (the largest ASD combination bears on the soil; C_D does not apply)
 * @example checkGroundElement({ kind: 'footing', data: { footing: 'new-pad', confirmed: true } }, { D: 2000, L: 4000 }, 'ASCE 7-16').pad?.sideIn // 26
 * Reference: IRC 2021 R401.4.1 (presumptive soil bearing), R403.1.1; ASCE 7 §2.4.1.
 */
export function checkGroundElement(
  element: Ground,
  landing: TypedLoad,
  edition: LoadStandard,
): GroundElementCheck {
  const out: GroundElementCheck = {
    checks: [],
    confirmed: false,
    engineerReasons: [],
    openReasons: [],
    assumptions: [],
  };
  const governing = governingLoad(landing, edition);
  if (element.kind === 'slab') {
    out.engineerReasons.push(
      'A slab is not a footing: the load needs a footing under it (a pad cut into the slab or a thickened slab); an engineer is required.',
    );
    return out;
  }
  if (element.kind === 'foundation-wall') {
    out.confirmed = element.confirmed;
    out.assumptions.push(
      'The foundation wall is taken to carry the load to its footing (sound and continuous; confirm on site).',
    );
    if (!element.confirmed) out.openReasons.push('Confirm the foundation wall under it (seen on site).');
    return out;
  }
  const footing = element.data;
  out.confirmed = footing.confirmed;
  const soilBearingPsf = footing.soilBearingPsf ?? PRESUMPTIVE_SOIL_BEARING_PSF;
  if (footing.soilBearingPsf === undefined) {
    out.assumptions.push(
      `Soil bearing ${soilBearingPsf} psf: the IRC presumptive value for unknown soil (R401.4.1).`,
    );
  }
  if (footing.footing === 'new-pad') {
    const padThicknessIn = footing.padThicknessIn ?? DEFAULT_NEW_PAD_THICKNESS_IN;
    const pad = sizeFootingPad({ loadLb: Math.max(governing.lb, 1), soilBearingPsf, padThicknessIn });
    out.pad = { sideIn: pad.sideIn, soilBearingPsf, loadLb: governing.lb };
    out.checks.push({
      label: `New pad ${pad.sideIn} × ${pad.sideIn} × ${padThicknessIn} in on the soil`,
      demand: pad.bearingPressurePsf,
      capacity: soilBearingPsf,
      unit: 'psf',
      ratio: pad.bearingPressurePsf / soilBearingPsf,
      pass: pad.bearingPressurePsf <= soilBearingPsf + 1e-9,
      combination: governing.combination,
      formula: '(P + pad weight) / area against the soil bearing',
    });
    out.assumptions.push(...pad.notes);
    if (!footing.confirmed)
      out.openReasons.push('Confirm the new pad: it is to be poured as sized (and inspected).');
    return out;
  }
  if (footing.widthIn === undefined || footing.lengthIn === undefined) {
    out.engineerReasons.push(
      'An existing footing of unknown size: what it carries cannot be checked; an engineer is required.',
    );
    return out;
  }
  const areaFt2 = (footing.widthIn * footing.lengthIn) / IN2_PER_FT2;
  const pressure = governing.lb / areaFt2;
  out.checks.push({
    label: `Existing footing ${footing.widthIn} × ${footing.lengthIn} in on the soil`,
    demand: pressure,
    capacity: soilBearingPsf,
    unit: 'psf',
    ratio: pressure / soilBearingPsf,
    pass: pressure <= soilBearingPsf,
    combination: governing.combination,
    formula: 'P / area against the soil bearing (the footing’s own weight not known: not added)',
  });
  out.assumptions.push(
    'Only the load of this chain is checked on the existing footing; what it already carries is not known.',
  );
  if (!footing.confirmed)
    out.openReasons.push('Confirm the existing footing (dig down to it, or see it on the plans).');
  return out;
}
