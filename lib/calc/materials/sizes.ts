import { CalcInputError } from '@/lib/calc/types';
import { ASSUMED_GLULAM_DENSITY_PCF, glulamSizeSets } from '@/tables/glulam/standard-sizes';
import { timberReferenceValues } from '@/tables/lumber/timber-reference-values';
import { ASSUMED_LVL_DENSITY_PCF, lvlDepthsIn, lvlPlyWidthIn } from '@/tables/lvl/generic-grades';
import { dressedLumber } from '@/tables/sections/dressed-lumber';
import { allMaterialSpecs, materialSpec, type MaterialSpec } from './catalog';
import { inchFraction } from './inch-fractions';
import type { MemberSize } from './types';

const IN2_PER_FT2 = 144;
const MAX_PLIES = 4;
/** Stud grade is graded to 6 in wide (NDS Supplement 2018 Table 4A, Stud 8 in and wider takes No.3). */
const STUD_MAX_NOMINAL_WIDTH_IN = 6;

function plyLabel(plies: number, nominal: string): string {
  return plies === 1 ? nominal : `${plies}-ply ${nominal}`;
}

function plyId(plies: number, base: string): string {
  return plies === 1 ? base : `${plies}-ply-${base}`;
}

function rectangle(
  materialId: string,
  plies: number,
  plyBIn: number,
  dIn: number,
  nominal: string,
  idBase: string,
  densityPcf: number,
): MemberSize {
  const bIn = plies * plyBIn;
  const areaIn2 = bIn * dIn;
  return Object.freeze({
    id: plyId(plies, idBase),
    materialId,
    label: plyLabel(plies, nominal),
    plies,
    bIn,
    dIn,
    areaIn2,
    sxIn3: (bIn * dIn * dIn) / 6,
    ixIn4: (bIn * dIn * dIn * dIn) / 12,
    selfWeightPlf: (areaIn2 / IN2_PER_FT2) * densityPcf,
    nominal,
  });
}

function sawnSizes(spec: Extract<MaterialSpec, { family: 'sawn' }>): MemberSize[] {
  const sizes: MemberSize[] = [];
  const materialId = spec.material.id;
  for (const row of dressedLumber) {
    if (spec.gradeId === 'stud' && row.nominalWidthIn > STUD_MAX_NOMINAL_WIDTH_IN) continue;
    if (row.nominalThicknessIn >= 5) {
      const hasTimberRow = timberReferenceValues.some(
        (t) => t.species === spec.speciesId && t.grade === spec.gradeId,
      );
      if (!hasTimberRow) continue;
    }
    const maxPlies = row.nominalThicknessIn === 2 ? MAX_PLIES : 1;
    for (let plies = 1; plies <= maxPlies; plies++) {
      sizes.push(
        Object.freeze({
          id: plyId(plies, row.nominal),
          materialId,
          label: plyLabel(plies, row.nominal),
          plies,
          bIn: plies * row.bIn,
          dIn: row.dIn,
          areaIn2: plies * row.areaIn2,
          sxIn3: plies * row.sxIn3,
          ixIn4: plies * row.ixIn4,
          selfWeightPlf: plies * row.weightPlf,
          nominal: row.nominal,
        }),
      );
    }
  }
  return sizes;
}

function glulamSizes(spec: Extract<MaterialSpec, { family: 'glulam' }>): MemberSize[] {
  const set = glulamSizeSets.find((s) => s.speciesGroup === spec.stressClass.speciesGroup);
  if (!set) throw new Error(`No glulam size set for ${spec.stressClass.speciesGroup}`);
  const sizes: MemberSize[] = [];
  for (const bIn of set.widthsIn) {
    for (const dIn of set.depthsIn) {
      const nominal = `${inchFraction(bIn)} x ${inchFraction(dIn)}`;
      sizes.push(
        rectangle(spec.material.id, 1, bIn, dIn, nominal, `${bIn}x${dIn}`, ASSUMED_GLULAM_DENSITY_PCF),
      );
    }
  }
  return sizes;
}

function lvlSizes(spec: Extract<MaterialSpec, { family: 'lvl' }>): MemberSize[] {
  const sizes: MemberSize[] = [];
  for (const dIn of lvlDepthsIn) {
    const nominal = `${inchFraction(lvlPlyWidthIn)} x ${inchFraction(dIn)}`;
    for (let plies = 1; plies <= MAX_PLIES; plies++) {
      sizes.push(
        rectangle(
          spec.material.id,
          plies,
          lvlPlyWidthIn,
          dIn,
          nominal,
          `${lvlPlyWidthIn}x${dIn}`,
          ASSUMED_LVL_DENSITY_PCF,
        ),
      );
    }
  }
  return sizes;
}

function sizesFor(spec: MaterialSpec): MemberSize[] {
  if (spec.family === 'sawn') return sawnSizes(spec);
  if (spec.family === 'glulam') return glulamSizes(spec);
  return lvlSizes(spec);
}

interface SizeIndex {
  all: readonly MemberSize[];
  /** byPlies[n] = the sizes with n plies. */
  byPlies: readonly (readonly MemberSize[])[];
  byId: ReadonlyMap<string, MemberSize>;
}

const SIZE_INDEX = new Map<string, SizeIndex>();
for (const spec of allMaterialSpecs()) {
  const all = Object.freeze(sizesFor(spec));
  const byPlies: MemberSize[][] = Array.from({ length: MAX_PLIES + 1 }, () => []);
  for (const size of all) byPlies[size.plies].push(size);
  SIZE_INDEX.set(spec.material.id, {
    all,
    byPlies: byPlies.map((list) => Object.freeze(list)),
    byId: new Map(all.map((size) => [size.id, size])),
  });
}

function indexFor(materialId: string): SizeIndex {
  const index = SIZE_INDEX.get(materialId);
  if (!index) {
    materialSpec(materialId);
    throw new CalcInputError('materialId', `No sizes for material "${materialId}"`);
  }
  return index;
}

/**
 * The sizes offered in one material, precomputed once: sawn 2x sizes in 1 to 4 plies, 4x single,
 * 6x timbers where Table 4D values are held; glulam single; LVL 1 to 4 plies of 1-3/4 in. The arrays are
 * shared and frozen: copy before sorting.
 * @param materialId material id (see listMaterials)
 * @param opts.plies keep only these ply counts (e.g. [2, 3])
 * @returns sizes, shallowest first within each nominal width
 * @throws CalcInputError('materialId') when the material is unknown
 * @example listSizes('lvl-2.0e', { plies: [2] })[0].label // '2-ply 1-3/4 x 5-1/2'
 * Reference: NDS Supplement 2018 Table 1B (sawn), standard glulam and LVL sizes (common practice).
 */
export function listSizes(materialId: string, opts?: { plies?: readonly number[] }): readonly MemberSize[] {
  const index = indexFor(materialId);
  if (!opts?.plies) return index.all;
  if (opts.plies.length === 1) return index.byPlies[opts.plies[0]] ?? [];
  const wanted = new Set(opts.plies);
  return index.all.filter((size) => wanted.has(size.plies));
}

/**
 * One size of a material by id ("2x10", "2-ply-2x10", "5.125x12", "2-ply-1.75x11.875").
 * @throws CalcInputError('sizeId') when the material has no such size
 * @example getSize('sawn-douglas-fir-larch-no2', '2-ply-2x10').bIn // 3
 * Reference: NDS Supplement 2018 Table 1B; standard glulam and LVL sizes (common practice).
 */
export function getSize(materialId: string, sizeId: string): MemberSize {
  const size = indexFor(materialId).byId.get(sizeId);
  if (!size) throw new CalcInputError('sizeId', `Size "${sizeId}" is not offered in ${materialId}`);
  return size;
}
