import { CalcInputError } from '@/lib/calc/types';
import { sawnSpecies } from '@/tables/lumber/sawn-reference-values';
import { listMaterials } from './catalog';
import { referenceValues } from './reference-values';
import { listSizes } from './sizes';
import type { Material } from './types';

/**
 * The weakest listed grade of a sawn species, for lumber whose grade stamp cannot be read: the grade with
 * the lowest F_b at its widest listed 2x size, ties broken by the lower E. Callers add the "unknown grade"
 * warning.
 * @param species species id ("hem-fir") or label ("Hem-Fir"), case-insensitive
 * @returns the weakest sawn material of that species (e.g. No.3 where No.3 is tabulated)
 * @throws CalcInputError('species') when the species is not a sawn species in the catalogue
 * @example weakestGrade('douglas-fir-larch').grade // 'No.3'
 * Reference: NDS Supplement 2018 Tables 4A, 4B; DESIGN.md §5 (unknown grade → weakest grade of the species).
 */
export function weakestGrade(species: string): Material {
  const key = species.trim().toLowerCase();
  const row = sawnSpecies.find((s) => s.id === key || s.label.toLowerCase() === key);
  if (!row) throw new CalcInputError('species', `Unknown sawn species "${species}"`);
  let weakest: Material | null = null;
  let weakestFb = Infinity;
  let weakestE = Infinity;
  for (const material of listMaterials('sawn')) {
    if (material.species !== row.id) continue;
    const sizes = listSizes(material.id, { plies: [1] }).filter((s) => s.bIn < 3);
    const values = referenceValues(material.id, sizes[sizes.length - 1]);
    if (values.FbPsi < weakestFb || (values.FbPsi === weakestFb && values.EPsi < weakestE)) {
      weakest = material;
      weakestFb = values.FbPsi;
      weakestE = values.EPsi;
    }
  }
  if (!weakest) throw new CalcInputError('species', `No grades listed for "${species}"`);
  return weakest;
}
