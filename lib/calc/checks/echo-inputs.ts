import type { InputFlag } from '@/lib/calc/types';
import type { EchoedInput, MemberCheckInput } from '@/shared/schemas/calc/member';
import type { MemberSpans } from './prepare-member';

type Field = keyof MemberCheckInput;

/**
 * The member's inputs as used, each with its flag: a field the user left out is `default`; a field given
 * takes the flag in `input.flags`, else `assumed`. Snow inputs (ground snow and its factors) are echoed as
 * `snow.<name>` with the flag given for `snow.<name>`, else for `snow`, else `assumed`.
 *
 * @param input member input; spans resolved spans (ft, in); used the values actually used by field
 * @returns echoed inputs with labels and units
 * @example echoInputs(input, spans, { materialLabel: 'Hem-Fir No.1', sizeLabel: '2x8', plateLabel: 'SPF', supportWidthIn: 3.5 });
 * Reference: DESIGN.md §5 — every input carries a flag: measured, assumed or default.
 */
export function echoInputs(
  input: MemberCheckInput,
  spans: MemberSpans,
  used: { materialLabel: string; sizeLabel: string; plateLabel: string | null; supportWidthIn: number },
): EchoedInput[] {
  const flagOf = (field: Field): InputFlag =>
    input[field] === undefined ? 'default' : (input.flags?.[field] ?? 'assumed');
  const out: EchoedInput[] = [];
  const add = (field: Field, label: string, value: number | string | boolean, unit?: string) =>
    out.push({ field, label, value, unit, flag: flagOf(field) });
  add('kind', 'Member', input.kind);
  add('edition', 'Load standard', input.edition);
  add('clearSpanFt', 'Clear span', spans.clearSpanFt, 'ft');
  add('bearingLeftIn', 'Bearing length, left', spans.bearingLeftIn, 'in');
  add('bearingRightIn', 'Bearing length, right', spans.bearingRightIn, 'in');
  add('materialId', 'Material', used.materialLabel);
  add('sizeId', 'Size', used.sizeLabel);
  add('gradeUnknown', 'Grade unknown', input.gradeUnknown ?? false);
  add('roofPitchIn12', 'Roof slope (in 12)', input.roofPitchIn12 ?? 0);
  if (input.snow) {
    const snow = input.snow;
    const addSnow = (
      key: keyof typeof snow,
      label: string,
      value: number | string | boolean,
      unit?: string,
    ) =>
      out.push({
        field: `snow.${key}`,
        label,
        value,
        unit,
        flag: input.flags?.[`snow.${key}`] ?? input.flags?.snow ?? 'assumed',
      });
    addSnow('groundSnowPsf', 'Ground snow p_g', snow.groundSnowPsf, 'psf');
    addSnow('riskCategory', 'Risk category', snow.riskCategory);
    addSnow('exposureCe', 'Exposure factor C_e', snow.exposureCe);
    addSnow('thermalCt', 'Thermal factor C_t', snow.thermalCt);
    if (snow.importanceIs !== undefined)
      addSnow('importanceIs', 'Snow importance factor I_s', snow.importanceIs);
    addSnow('slipperyUnobstructed', 'Unobstructed slippery roof', snow.slipperyUnobstructed);
    addSnow('roofStepsDown', 'Roof steps down (drift)', snow.roofStepsDown);
  }
  add('selfWeight', 'Self-weight included', input.selfWeight ?? true);
  add('wetService', 'Wet service', input.wetService ?? false);
  add('temperatureF', 'Service temperature', input.temperatureF ?? 70, '°F');
  add(
    'unbracedLengthFt',
    'Unbraced length of the top edge',
    input.unbracedLengthFt ?? 'braced by framing',
    input.unbracedLengthFt === undefined ? undefined : 'ft',
  );
  add('repetitive', 'Repetitive member (C_r)', input.repetitive ?? false);
  add('flatUse', 'Flat use', input.flatUse ?? false);
  add('incised', 'Incised', input.incised ?? false);
  add('shearAtD', 'Shear at d from the supports', input.shearAtD ?? true);
  add('deflectionUse', 'Deflection limits', input.deflectionUse ?? 'floor');
  if (input.deflectionCapIn !== undefined)
    add('deflectionCapIn', 'Deflection cap', input.deflectionCapIn, 'in');
  add('sustainedLiveFraction', 'Sustained part of live load', input.sustainedLiveFraction ?? 0);
  add('supportKind', 'Support', input.supportKind ?? 'jacks');
  add('supportWidthIn', 'Support width', used.supportWidthIn, 'in');
  if (used.plateLabel) add('plateMaterialId', 'Plate under the jacks', used.plateLabel);
  add('mount', 'Mounting', input.mount ?? 'dropped');
  return out;
}
