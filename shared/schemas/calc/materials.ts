import { z } from 'zod';

/**
 * Zod contracts for the engine's reference tables (every row is validated in tests) and for the inputs of
 * the post, shoring wall and footing pad checks. Units: psi for design values, in for section dimensions,
 * ft for heights, lb and plf for loads, psf for soil bearing, pcf for densities.
 */

const psi = z.number().positive().finite();
const factor = z.number().positive().max(2);
const provenance = z.enum(['references', 'from memory']);
/** Largest nominal width a row covers; Infinity stands for "and wider". */
const widthBound = z.union([z.number().positive(), z.custom<number>((v) => v === Infinity)]);

export const sawnReferenceRowSchema = z
  .object({
    species: z.enum(['douglas-fir-larch', 'hem-fir', 'spruce-pine-fir', 'southern-pine']),
    grade: z.enum(['select-structural', 'no1', 'no2', 'no1-no2', 'no3', 'stud']),
    nominalWidthIn: z
      .union([z.literal(4), z.literal(6), z.literal(8), z.literal(10), z.literal(12)])
      .nullable(),
    FbPsi: psi.max(3500),
    FtPsi: psi.max(2500),
    FvPsi: psi.max(300),
    FcPerpPsi: psi.max(1000),
    FcPsi: psi.max(3000),
    EPsi: psi.min(800_000).max(2_500_000),
    EminPsi: psi.min(250_000).max(1_000_000),
    provenance,
  })
  .refine((row) => row.EminPsi < row.EPsi, { message: 'E_min must be below E' });

export const timberReferenceRowSchema = z
  .object({
    species: z.enum(['douglas-fir-larch', 'hem-fir', 'spruce-pine-fir', 'southern-pine']),
    grade: z.enum(['select-structural', 'no1', 'no2']),
    use: z.enum(['beams-and-stringers', 'posts-and-timbers']),
    FbPsi: psi.max(2500),
    FtPsi: psi.max(2000),
    FvPsi: psi.max(250),
    FcPerpPsi: psi.max(1000),
    FcPsi: psi.max(2000),
    EPsi: psi.min(800_000).max(2_500_000),
    EminPsi: psi.min(250_000).max(1_000_000),
    provenance,
  })
  .refine((row) => row.EminPsi < row.EPsi, { message: 'E_min must be below E' });

export const sizeFactorRowSchema = z.object({
  maxNominalWidthIn: widthBound,
  fbThin: factor,
  fbThick: factor,
  ft: factor,
  fc: factor,
});

export const flatUseRowSchema = z.object({
  maxNominalWidthIn: widthBound,
  thin: z.number().min(1).max(1.5),
  thick: z.number().min(1).max(1.5),
});

export const wetServiceRowSchema = z.object({
  fb: factor.max(1),
  ft: factor.max(1),
  fv: factor.max(1),
  fcPerp: factor.max(1),
  fc: factor.max(1),
  e: factor.max(1),
  fbThresholdPsi: psi.nullable(),
  fcThresholdPsi: psi.nullable(),
});

export const dressedLumberRowSchema = z.object({
  nominal: z.string().regex(/^\d+x\d+$/),
  nominalThicknessIn: z.number().int().min(2).max(12),
  nominalWidthIn: z.number().int().min(2).max(16),
  bIn: z.number().positive(),
  dIn: z.number().positive(),
  areaIn2: z.number().positive(),
  sxIn3: z.number().positive(),
  ixIn4: z.number().positive(),
  weightPlf: z.number().positive(),
});

export const glulamStressClassRowSchema = z
  .object({
    id: z.string().min(1),
    label: z.string().min(1),
    speciesGroup: z.enum(['western', 'southern-pine']),
    FbxPosPsi: psi.max(3500),
    FbxNegPsi: psi.max(3500),
    FcPerpxPsi: psi.max(1000),
    FvxPsi: psi.max(400),
    FcPsi: psi.max(3000),
    ExPsi: psi.min(1_000_000).max(2_500_000),
    ExMinPsi: psi.min(500_000).max(1_500_000),
    provenance,
  })
  .refine((row) => row.FbxNegPsi <= row.FbxPosPsi, { message: 'F_bx− cannot exceed F_bx+' });

export const glulamSizeSetSchema = z
  .object({
    speciesGroup: z.enum(['western', 'southern-pine']),
    laminationIn: z.number().positive(),
    widthsIn: z.array(z.number().positive().max(12)).min(1).max(20),
    depthsIn: z.array(z.number().positive().max(48)).min(1).max(60),
  })
  .refine(
    (set) =>
      set.depthsIn.every((d) => Math.abs(d / set.laminationIn - Math.round(d / set.laminationIn)) < 1e-9),
    {
      message: 'Every depth must be a whole number of laminations',
    },
  );

export const lvlGradeRowSchema = z.object({
  id: z.string().min(1),
  label: z.string().min(1),
  FbPsi: psi.max(3500),
  depthExponent: z.number().positive().max(0.25),
  FvPsi: psi.max(400),
  FcPerpPsi: psi.max(1200),
  FcPsi: psi.max(4000),
  EPsi: psi.min(1_000_000).max(2_500_000),
  EminPsi: psi.min(500_000).max(1_500_000),
  generic: z.literal(true),
  note: z.literal("generic: confirm with the manufacturer's published values"),
});

const positive = (label: string) =>
  z.number({ message: `Enter ${label}` }).positive({ message: `${label} must be above 0` });

/** Inputs of a post check (lib/calc/columns checkColumn). */
export const columnInputSchema = z.object({
  materialId: z.string().min(1, { message: 'Choose a material' }),
  sizeId: z.string().min(1, { message: 'Choose a post size' }),
  heightFt: positive('the post height').max(40, { message: 'At most 40 ft' }),
  loadLb: z
    .number()
    .min(0, { message: 'Load cannot be negative' })
    .max(200_000, { message: 'At most 200,000 lb' }),
  CD: z.number().min(0.9).max(2),
  weakAxisBraced: z.boolean().optional(),
  weakAxisUnbracedFt: positive('the weak-axis unbraced length').optional(),
  fastening: z.enum(['nailed', 'bolted']).optional(),
  wet: z.boolean().optional(),
});

/** Inputs of a temporary shoring wall check (lib/calc/columns checkShoringWall). */
export const shoringWallInputSchema = z.object({
  loadPlf: positive('the shoring load').max(20_000, { message: 'At most 20,000 plf' }),
  studSpacingIn: positive('the stud spacing').max(48, { message: 'At most 48 in' }),
  heightFt: positive('the wall height').max(20, { message: 'At most 20 ft' }),
  materialId: z.string().min(1, { message: 'Choose a stud material' }),
  studSizeId: z.string().min(1, { message: 'Choose a stud size' }),
  plateMaterialId: z.string().min(1).optional(),
  weakAxisBracing: z.enum(['none', 'mid-height-blocking', 'sheathing']).optional(),
  CD: z.number().min(0.9).max(2).optional(),
});

/** Inputs of a footing pad sizing (lib/calc/columns sizeFootingPad). */
export const footingPadInputSchema = z.object({
  loadLb: positive('the post load').max(200_000, { message: 'At most 200,000 lb' }),
  soilBearingPsf: positive('the soil bearing').max(12_000, { message: 'At most 12,000 psf' }).optional(),
  padThicknessIn: positive('the pad thickness').max(48, { message: 'At most 48 in' }),
  concreteDensityPcf: positive('the concrete density').max(200).optional(),
});

export type ColumnInputBody = z.infer<typeof columnInputSchema>;
export type ShoringWallInputBody = z.infer<typeof shoringWallInputSchema>;
export type FootingPadInputBody = z.infer<typeof footingPadInputSchema>;
