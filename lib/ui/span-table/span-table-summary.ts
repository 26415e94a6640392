import { DEFAULT_BEARING_IN, DEFLECTION_PRESETS, getMaterial } from '@/lib/calc';
import { formatIn, formatNumberTrimmed } from '@/lib/format';
import type { SpanTableInput } from '@/shared/schemas/calc/span-table';

/** One assumption a table was built under, as printed beside it. */
export type Assumption = { label: string; value: string };

const psfText = (psf: number | undefined) =>
  psf === undefined || psf === 0 ? 'none' : `${formatNumberTrimmed(psf, 1)} psf`;

function pliesText(plies: readonly number[]): string {
  const sorted = [...plies].sort((a, b) => a - b);
  const list =
    sorted.length === 1
      ? String(sorted[0])
      : `${sorted.slice(0, -1).join(', ')} or ${sorted[sorted.length - 1]}`;
  return `${list} ${sorted.length === 1 && sorted[0] === 1 ? 'ply' : 'plies'}`;
}

/**
 * What a span table assumes, in the order it is printed: material, loads, load standard, deflection use,
 * bearing and plies. Defaults the engine applies (bearing 3 in, self-weight on) are stated as applied.
 *
 * @example assumptionsOf(input)[0] // { label: 'Material', value: 'Douglas Fir-Larch No.2' }
 */
export function assumptionsOf(input: SpanTableInput): Assumption[] {
  const preset = DEFLECTION_PRESETS[input.deflectionUse ?? 'floor'];
  const selfWeight = input.selfWeight ?? true;
  return [
    { label: 'Material', value: input.materialIds.map((id) => getMaterial(id).label).join('; ') },
    {
      label: 'Dead load',
      value: `${psfText(input.deadPsf)}${selfWeight ? ', plus the member’s own weight' : ''}`,
    },
    { label: 'Live load', value: psfText(input.livePsf) },
    { label: 'Roof live load', value: psfText(input.roofLivePsf) },
    { label: 'Roof snow load', value: psfText(input.roofSnowPsf) },
    { label: 'Load standard', value: `${input.edition}, ASD load combinations (§2.4)` },
    {
      label: 'Deflection use',
      value: `${preset.label}: L/${preset.liveRatio} under live, roof live or snow load; L/${preset.totalRatio} total`,
    },
    { label: 'Bearing', value: `${formatIn(input.bearingIn ?? DEFAULT_BEARING_IN)} at each end` },
    { label: 'Plies', value: input.plies ? pliesText(input.plies) : 'all' },
  ];
}
