import type { InputFlag } from '@/lib/calc/types';
import type { EchoedInput, MemberCheckInput } from '@/shared/schemas/calc/member';
import type { MemberSpans } from './prepare-member';

type Field = keyof MemberCheckInput;
type SnowInputs = NonNullable<MemberCheckInput['snow']>;

/**
 * Collects echoed inputs for one member. A class rather than closures in echoInputs: its methods are made
 * once, not on every member check.
 */
class EchoList {
  readonly out: EchoedInput[] = [];
  private readonly input: MemberCheckInput;

  constructor(input: MemberCheckInput) {
    this.input = input;
  }

  add(field: Field, label: string, value: number | string | boolean, unit?: string): void {
    const input = this.input;
    const flag: InputFlag = input[field] === undefined ? 'default' : (input.flags?.[field] ?? 'assumed');
    this.out.push({ field, label, value, unit, flag });
  }

  addSnow(key: keyof SnowInputs, label: string, value: number | string | boolean, unit?: string): void {
    const flags = this.input.flags;
    const absent = this.input.snow?.[key] === undefined;
    this.out.push({
      field: `snow.${key}`,
      label,
      value,
      unit,
      flag: absent ? 'default' : (flags?.[`snow.${key}`] ?? flags?.snow ?? 'assumed'),
    });
  }
}

/**
 * The member's inputs as used, each with its flag: a field the user left out is `default`; a field given
 * takes the flag in `input.flags`, else `assumed`. Snow inputs (ground snow and its factors) are echoed as
 * `snow.<name>` with the flag given for `snow.<name>`, else for `snow`, else `assumed` (`default` for an
 * optional snow input left out, such as the thermal condition; C_t is echoed as used).
 *
 * @param input member input; spans resolved spans (ft, in); used the values actually used by field
 * @returns echoed inputs with labels and units
 * @example echoInputs(input, spans, { materialLabel: 'Hem-Fir No.1', sizeLabel: '2x8', plateLabel: 'SPF', supportWidthIn: 3.5 });
 * Reference: DESIGN.md §5 — every input carries a flag: measured, assumed or default.
 */
export function echoInputs(
  input: MemberCheckInput,
  spans: MemberSpans,
  used: {
    materialLabel: string;
    sizeLabel: string;
    plateLabel: string | null;
    supportWidthIn: number;
    /** The roof's thermal condition and C_t the snow used (when the member has snow). */
    snowThermal?: { condition: string; ct: number };
  },
): EchoedInput[] {
  const echo = new EchoList(input);
  echo.add('kind', 'Member', input.kind);
  echo.add('edition', 'Load standard', input.edition);
  echo.add('clearSpanFt', 'Clear span', spans.clearSpanFt, 'ft');
  echo.add('bearingLeftIn', 'Bearing length, left', spans.bearingLeftIn, 'in');
  echo.add('bearingRightIn', 'Bearing length, right', spans.bearingRightIn, 'in');
  if (spans.secondClearSpanFt !== undefined) {
    echo.add('secondClearSpanFt', 'Second clear span (continuous)', spans.secondClearSpanFt, 'ft');
    echo.add('centreBearingIn', 'Bearing length, centre post', spans.centreBearingIn ?? 0, 'in');
  }
  if (spans.overhangLeftFt !== undefined)
    echo.add('overhangLeftFt', 'Overhang past the left support', spans.overhangLeftFt, 'ft');
  if (spans.overhangRightFt !== undefined)
    echo.add('overhangRightFt', 'Overhang past the right support', spans.overhangRightFt, 'ft');
  echo.add('materialId', 'Material', used.materialLabel);
  echo.add('sizeId', 'Size', used.sizeLabel);
  echo.add('gradeUnknown', 'Grade unknown', input.gradeUnknown ?? false);
  echo.add('roofPitchIn12', 'Roof slope (in 12)', input.roofPitchIn12 ?? 0);
  if (input.snow) {
    const snow = input.snow;
    echo.addSnow('groundSnowPsf', 'Ground snow p_g', snow.groundSnowPsf, 'psf');
    echo.addSnow('riskCategory', 'Risk category', snow.riskCategory);
    echo.addSnow('exposureCe', 'Exposure factor C_e', snow.exposureCe);
    if (used.snowThermal) {
      echo.addSnow('thermalCondition', 'Roof thermal condition', used.snowThermal.condition);
      echo.addSnow('thermalCt', 'Thermal factor C_t', used.snowThermal.ct);
    }
    if (snow.roofInsulationR !== undefined)
      echo.addSnow('roofInsulationR', 'Roof insulation R', snow.roofInsulationR, 'ft²·h·°F/Btu');
    if (snow.importanceIs !== undefined)
      echo.addSnow('importanceIs', 'Snow importance factor I_s', snow.importanceIs);
    echo.addSnow('slipperyUnobstructed', 'Unobstructed slippery roof', snow.slipperyUnobstructed);
    echo.addSnow('roofStepsDown', 'Roof steps down (drift)', snow.roofStepsDown);
  }
  echo.add('selfWeight', 'Self-weight included', input.selfWeight ?? true);
  echo.add('wetService', 'Wet service', input.wetService ?? false);
  echo.add('temperatureF', 'Service temperature', input.temperatureF ?? 70, '°F');
  echo.add(
    'unbracedLengthFt',
    'Unbraced length of the top edge',
    input.unbracedLengthFt ?? 'braced by framing',
    input.unbracedLengthFt === undefined ? undefined : 'ft',
  );
  echo.add('repetitive', 'Repetitive member (C_r)', input.repetitive ?? false);
  echo.add('flatUse', 'Flat use', input.flatUse ?? false);
  echo.add('incised', 'Incised', input.incised ?? false);
  echo.add('shearAtD', 'Shear at d from the supports', input.shearAtD ?? true);
  echo.add('deflectionUse', 'Deflection limits', input.deflectionUse ?? 'floor');
  if (input.deflectionCapIn !== undefined)
    echo.add('deflectionCapIn', 'Deflection cap', input.deflectionCapIn, 'in');
  echo.add('sustainedLiveFraction', 'Sustained part of live load', input.sustainedLiveFraction ?? 0);
  echo.add('supportKind', 'Support', input.supportKind ?? 'jacks');
  echo.add('supportWidthIn', 'Support width', used.supportWidthIn, 'in');
  if (used.plateLabel) echo.add('plateMaterialId', 'Plate under the jacks', used.plateLabel);
  echo.add('mount', 'Mounting', input.mount ?? 'dropped');
  if (input.mount === 'raised' && input.atticClearanceIn !== undefined)
    echo.add('atticClearanceIn', 'Attic clearance above the ceiling line', input.atticClearanceIn, 'in');
  return echo.out;
}
