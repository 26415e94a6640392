import { CalcInputError } from '@/lib/calc/types';
import { glulamStressClasses, type GlulamStressClassRow } from '@/tables/glulam/stress-classes';
import {
  sawnGradeLabels,
  sawnReferenceValues,
  sawnSpecies,
  type SawnGradeId,
  type SawnSpeciesId,
} from '@/tables/lumber/sawn-reference-values';
import { lvlGenericGrades, type LvlGradeRow } from '@/tables/lvl/generic-grades';
import type { Material, MaterialFamily } from './types';

/** What the engine needs to know about a material beyond its public description. */
export type MaterialSpec =
  | { family: 'sawn'; material: Material; speciesId: SawnSpeciesId; gradeId: SawnGradeId; table: '4A' | '4B' }
  | { family: 'glulam'; material: Material; stressClass: GlulamStressClassRow }
  | { family: 'lvl'; material: Material; grade: LvlGradeRow };

const SUPPLEMENT = 'NDS Supplement 2018';

function buildSpecs(): MaterialSpec[] {
  const specs: MaterialSpec[] = [];
  for (const species of sawnSpecies) {
    const grades = new Set<SawnGradeId>();
    for (const row of sawnReferenceValues) if (row.species === species.id) grades.add(row.grade);
    for (const gradeId of grades) {
      const grade = sawnGradeLabels[gradeId];
      specs.push({
        family: 'sawn',
        speciesId: species.id,
        gradeId,
        table: species.table,
        material: {
          id: `sawn-${species.id}-${gradeId}`,
          family: 'sawn',
          label: `${species.label} ${grade}`,
          species: species.id,
          grade,
          source: `${SUPPLEMENT} Table ${species.table}`,
        },
      });
    }
  }
  for (const stressClass of glulamStressClasses) {
    specs.push({
      family: 'glulam',
      stressClass,
      material: {
        id: `glulam-${stressClass.id}`,
        family: 'glulam',
        label: stressClass.label,
        species: stressClass.speciesGroup,
        grade: stressClass.label.split(' ')[0],
        source: `${SUPPLEMENT} Table 5A`,
      },
    });
  }
  for (const grade of lvlGenericGrades) {
    specs.push({
      family: 'lvl',
      grade,
      material: {
        id: `lvl-${grade.id}`,
        family: 'lvl',
        label: grade.label,
        species: 'lvl',
        grade: grade.id.toUpperCase(),
        source: `Generic LVL values (NDS 2018 chapter 8); ${grade.note}`,
        generic: true,
      },
    });
  }
  return specs;
}

const SPECS = buildSpecs();
const SPEC_BY_ID = new Map(SPECS.map((spec) => [spec.material.id, spec]));
const ALL_MATERIALS = SPECS.map((spec) => spec.material);
const MATERIALS_BY_FAMILY: Record<MaterialFamily, Material[]> = {
  sawn: ALL_MATERIALS.filter((m) => m.family === 'sawn'),
  glulam: ALL_MATERIALS.filter((m) => m.family === 'glulam'),
  lvl: ALL_MATERIALS.filter((m) => m.family === 'lvl'),
};

/** Every material spec, in catalogue order (sawn by species and grade, glulam, LVL). */
export function allMaterialSpecs(): readonly MaterialSpec[] {
  return SPECS;
}

/**
 * The engine-side description of a material (species and grade ids, table row, species group).
 * @param materialId e.g. "sawn-douglas-fir-larch-no2"
 * @throws CalcInputError('materialId') when the id is unknown
 * @example materialSpec('glulam-24f-v4-df').family // 'glulam'
 * Reference: NDS Supplement 2018 Tables 4A, 4B, 5A; generic LVL (tables/lvl/generic-grades.ts).
 */
export function materialSpec(materialId: string): MaterialSpec {
  const spec = SPEC_BY_ID.get(materialId);
  if (!spec) throw new CalcInputError('materialId', `Unknown material "${materialId}"`);
  return spec;
}

/**
 * Lists the materials the engine can check, optionally one family only. The array is shared: do not mutate.
 * @param family 'sawn' | 'glulam' | 'lvl'; omitted = all
 * @example listMaterials('glulam').map((m) => m.id) // ['glulam-24f-1.8e-western', ...]
 * Reference: NDS Supplement 2018 Tables 4A, 4B, 5A; generic LVL values.
 */
export function listMaterials(family?: MaterialFamily): readonly Material[] {
  return family ? MATERIALS_BY_FAMILY[family] : ALL_MATERIALS;
}

/**
 * One material by id.
 * @throws CalcInputError('materialId') when the id is unknown
 * @example getMaterial('sawn-hem-fir-no2').label // 'Hem-Fir No.2'
 * Reference: NDS Supplement 2018 Tables 4A, 4B, 5A; generic LVL values.
 */
export function getMaterial(materialId: string): Material {
  return materialSpec(materialId).material;
}
