import { CalcInputError } from '@/lib/calc/types';
import { sawnReferenceValues, type SawnReferenceRow } from '@/tables/lumber/sawn-reference-values';
import { timberReferenceValues, type TimberUse } from '@/tables/lumber/timber-reference-values';
import { allMaterialSpecs, materialSpec, type MaterialSpec } from './catalog';
import { nominalWidthForDepth, thicknessClass } from './size-geometry';
import type { DesignValues, MemberSize } from './types';

type Resolver = (size: MemberSize) => DesignValues;

/** Table 4D: Beams and Stringers when the width exceeds the thickness by more than 2 in (nominal). */
const BEAMS_AND_STRINGERS_MIN_EXCESS_IN = 2;
/** Table 4B rows stop at 12 in nominal; wider members use the 12 in row with C_F = 0.9. */
const SOUTHERN_PINE_WIDEST_ROW_IN = 12;

function designValues(
  row: Omit<SawnReferenceRow, 'species' | 'grade' | 'nominalWidthIn' | 'provenance' | 'FtPsi'>,
): DesignValues {
  return Object.freeze({
    FbPsi: row.FbPsi,
    FvPsi: row.FvPsi,
    FcPerpPsi: row.FcPerpPsi,
    FcPsi: row.FcPsi,
    EPsi: row.EPsi,
    EminPsi: row.EminPsi,
  });
}

function timberResolver(
  spec: Extract<MaterialSpec, { family: 'sawn' }>,
): ((size: MemberSize) => DesignValues) | null {
  const byUse = new Map<TimberUse, DesignValues>();
  for (const row of timberReferenceValues) {
    if (row.species === spec.speciesId && row.grade === spec.gradeId) byUse.set(row.use, designValues(row));
  }
  const beams = byUse.get('beams-and-stringers');
  const posts = byUse.get('posts-and-timbers');
  if (!beams || !posts) return null;
  return (size) => (size.dIn - size.bIn / size.plies > BEAMS_AND_STRINGERS_MIN_EXCESS_IN ? beams : posts);
}

function sawnResolver(spec: Extract<MaterialSpec, { family: 'sawn' }>): Resolver {
  const rows = sawnReferenceValues.filter((r) => r.species === spec.speciesId && r.grade === spec.gradeId);
  const timbers = timberResolver(spec);
  const noTimbers = (): never => {
    throw new CalcInputError('sizeId', `${spec.material.label} has no timber (5 in and thicker) values here`);
  };
  if (spec.table === '4A') {
    const values = designValues(rows[0]);
    return (size) => (thicknessClass(size) === 'timber' ? (timbers ?? noTimbers)(size) : values);
  }
  const byWidth = new Map(rows.map((row) => [row.nominalWidthIn, designValues(row)]));
  return (size) => {
    if (thicknessClass(size) === 'timber') return (timbers ?? noTimbers)(size);
    const widthIn = Math.min(nominalWidthForDepth(size.dIn), SOUTHERN_PINE_WIDEST_ROW_IN);
    const values = byWidth.get(widthIn === 5 ? 6 : (widthIn as 4 | 6 | 8 | 10 | 12));
    if (!values) throw new CalcInputError('sizeId', `${spec.material.label} has no ${widthIn} in row`);
    return values;
  };
}

function resolverFor(spec: MaterialSpec): Resolver {
  if (spec.family === 'sawn') return sawnResolver(spec);
  if (spec.family === 'glulam') {
    const c = spec.stressClass;
    const values = Object.freeze({
      FbPsi: c.FbxPosPsi,
      FvPsi: c.FvxPsi,
      FcPerpPsi: c.FcPerpxPsi,
      FcPsi: c.FcPsi,
      EPsi: c.ExPsi,
      EminPsi: c.ExMinPsi,
    });
    return () => values;
  }
  const values = designValues(spec.grade);
  return () => values;
}

const RESOLVERS = new Map<string, Resolver>(
  allMaterialSpecs().map((spec) => [spec.material.id, resolverFor(spec)]),
);

/**
 * Reference design values of a material for one size: Table 4A values are the same for every width (the
 * size factor C_F is applied separately); Table 4B (Southern Pine) values depend on the width; 6x members of
 * Douglas Fir-Larch and Hem-Fir take Table 4D (Beams and Stringers or Posts and Timbers). Glulam returns
 * F_bx+ (positive moment), F_vx, F_c⊥x, axial F_c, E_x, E_x,min. No allocation: the returned objects are
 * shared and frozen.
 * @param materialId material id
 * @param size the member size (any size, including a measured one); only bIn, dIn and plies are read
 * @returns reference values in psi, normal load duration, dry service
 * @throws CalcInputError('materialId') for an unknown material; CalcInputError('sizeId') when the source
 *   table holds no values for that size
 * @example referenceValues('sawn-southern-pine-no2', getSize('sawn-southern-pine-no2', '2x10')).FbPsi // 800
 * Reference: NDS Supplement 2018 Tables 4A, 4B, 4D, 5A; generic LVL values (confirm with the manufacturer).
 */
export function referenceValues(materialId: string, size: MemberSize): DesignValues {
  const resolve = RESOLVERS.get(materialId);
  if (!resolve) {
    materialSpec(materialId);
    throw new CalcInputError('materialId', `No design values for "${materialId}"`);
  }
  return resolve(size);
}
