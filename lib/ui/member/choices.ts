import { DEFLECTION_PRESETS, listMaterials, listSizes } from '@/lib/calc';
import type { Choice } from '@/lib/ui/choice-group';
import { deflectionUses, type DeflectionUse } from '@/shared/schemas/calc/member';

export type MaterialFamily = 'sawn' | 'glulam' | 'lvl';

export const familyChoices: Choice<MaterialFamily>[] = [
  { value: 'sawn', label: 'Sawn lumber' },
  { value: 'lvl', label: 'LVL' },
  { value: 'glulam', label: 'Glulam' },
];

/** The materials of a family, labelled as the catalogue names them, with their source table. */
export function materialChoices(family: MaterialFamily): Choice<string>[] {
  return listMaterials(family).map((m) => ({ value: m.id, label: m.label, description: m.source }));
}

/** The sizes of a material; `plies` narrows to those ply counts. */
export function sizeChoices(materialId: string, plies?: readonly number[]): Choice<string>[] {
  return listSizes(materialId, plies ? { plies } : undefined).map((s) => ({ value: s.id, label: s.label }));
}

/** The family a material id belongs to. */
export function familyOf(materialId: string): MaterialFamily {
  return listMaterials().find((m) => m.id === materialId)?.family ?? 'sawn';
}

/** Deflection presets by use, each labelled with its limits. */
export const deflectionChoices: Choice<DeflectionUse>[] = deflectionUses.map((use) => {
  const preset = DEFLECTION_PRESETS[use];
  return {
    value: use,
    label: preset.label,
    description: `L/${preset.liveRatio} live, L/${preset.totalRatio} total`,
  };
});
