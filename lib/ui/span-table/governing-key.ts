import type { DeflectionPreset } from '@/lib/calc';
import type { CheckId } from '@/shared/schemas/calc/member';

/** The short key printed beside a span for the check that limits it, and the words it stands for. */
export type GoverningKey = { key: string; word: string };

/** One key per check; a check added to the engine fails the type until it has its key here. */
export const GOVERNING_KEYS: Readonly<Record<CheckId, GoverningKey>> = {
  bending: { key: 'b', word: 'Bending' },
  shear: { key: 'v', word: 'Shear' },
  'deflection-live': { key: 'Δ', word: 'Deflection under live, roof live or snow load' },
  'deflection-total': { key: 'Δt', word: 'Total deflection, creep included' },
  bearing: { key: 'c', word: 'Bearing (crushing across the grain at the ends)' },
};

/**
 * The legend under a span table, in the order of GOVERNING_KEYS: each key and what it means, the
 * deflection lines with the limits of the chosen use.
 *
 * @example legendLines(DEFLECTION_PRESETS.floor)[2] // 'Δ = Deflection under live, roof live or snow load (L/360)'
 */
export function legendLines(preset: DeflectionPreset): string[] {
  return (Object.keys(GOVERNING_KEYS) as CheckId[]).map((id) => {
    const { key, word } = GOVERNING_KEYS[id];
    const limit =
      id === 'deflection-live'
        ? ` (L/${preset.liveRatio})`
        : id === 'deflection-total'
          ? ` (L/${preset.totalRatio})`
          : '';
    return `${key} = ${word}${limit}`;
  });
}
