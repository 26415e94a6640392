/**
 * Section properties of standard dressed (S4S) sawn lumber, dry sizes.
 *
 * Source: American Wood Council, NDS Supplement — Design Values for Wood Construction, 2018 edition,
 * Table 1B. Dressed dry sizes: thickness 1-1/2 in (2x) and 3-1/2 in (4x); widths 3-1/2, 5-1/2, 7-1/4, 9-1/4,
 * 11-1/4 in (4 to 12 in nominal), 13-1/4 and 15-1/4 in (14 and 16 in nominal); timbers 5 in and thicker are
 * nominal − 1/2 in both ways.
 * Units: bIn, dIn in in; areaIn2 in in²; sxIn3 in in³ (x-x axis, load on the narrow face); ixIn4 in in⁴;
 * weightPlf in lb/ft at an assumed density of 35 lb/ft³ (one of the densities Table 1B tabulates).
 * A, S and I are printed rounded to four significant figures, as in Table 1B.
 */

export const ASSUMED_SAWN_DENSITY_PCF = 35;

export interface DressedLumberRow {
  /** Nominal size, thickness × width, e.g. "2x10". */
  nominal: string;
  nominalThicknessIn: number;
  nominalWidthIn: number;
  bIn: number;
  dIn: number;
  areaIn2: number;
  sxIn3: number;
  ixIn4: number;
  weightPlf: number;
}

export const dressedLumber = [
  {
    nominal: '2x4',
    nominalThicknessIn: 2,
    nominalWidthIn: 4,
    bIn: 1.5,
    dIn: 3.5,
    areaIn2: 5.25,
    sxIn3: 3.063,
    ixIn4: 5.359,
    weightPlf: 1.276,
  },
  {
    nominal: '2x6',
    nominalThicknessIn: 2,
    nominalWidthIn: 6,
    bIn: 1.5,
    dIn: 5.5,
    areaIn2: 8.25,
    sxIn3: 7.563,
    ixIn4: 20.8,
    weightPlf: 2.005,
  },
  {
    nominal: '2x8',
    nominalThicknessIn: 2,
    nominalWidthIn: 8,
    bIn: 1.5,
    dIn: 7.25,
    areaIn2: 10.88,
    sxIn3: 13.14,
    ixIn4: 47.63,
    weightPlf: 2.643,
  },
  {
    nominal: '2x10',
    nominalThicknessIn: 2,
    nominalWidthIn: 10,
    bIn: 1.5,
    dIn: 9.25,
    areaIn2: 13.88,
    sxIn3: 21.39,
    ixIn4: 98.93,
    weightPlf: 3.372,
  },
  {
    nominal: '2x12',
    nominalThicknessIn: 2,
    nominalWidthIn: 12,
    bIn: 1.5,
    dIn: 11.25,
    areaIn2: 16.88,
    sxIn3: 31.64,
    ixIn4: 178.0,
    weightPlf: 4.102,
  },
  {
    nominal: '4x4',
    nominalThicknessIn: 4,
    nominalWidthIn: 4,
    bIn: 3.5,
    dIn: 3.5,
    areaIn2: 12.25,
    sxIn3: 7.146,
    ixIn4: 12.51,
    weightPlf: 2.977,
  },
  {
    nominal: '4x6',
    nominalThicknessIn: 4,
    nominalWidthIn: 6,
    bIn: 3.5,
    dIn: 5.5,
    areaIn2: 19.25,
    sxIn3: 17.65,
    ixIn4: 48.53,
    weightPlf: 4.679,
  },
  {
    nominal: '4x8',
    nominalThicknessIn: 4,
    nominalWidthIn: 8,
    bIn: 3.5,
    dIn: 7.25,
    areaIn2: 25.38,
    sxIn3: 30.66,
    ixIn4: 111.1,
    weightPlf: 6.168,
  },
  {
    nominal: '4x10',
    nominalThicknessIn: 4,
    nominalWidthIn: 10,
    bIn: 3.5,
    dIn: 9.25,
    areaIn2: 32.38,
    sxIn3: 49.91,
    ixIn4: 230.8,
    weightPlf: 7.869,
  },
  {
    nominal: '4x12',
    nominalThicknessIn: 4,
    nominalWidthIn: 12,
    bIn: 3.5,
    dIn: 11.25,
    areaIn2: 39.38,
    sxIn3: 73.83,
    ixIn4: 415.3,
    weightPlf: 9.57,
  },
  {
    nominal: '4x14',
    nominalThicknessIn: 4,
    nominalWidthIn: 14,
    bIn: 3.5,
    dIn: 13.25,
    areaIn2: 46.38,
    sxIn3: 102.4,
    ixIn4: 678.5,
    weightPlf: 11.27,
  },
  {
    nominal: '4x16',
    nominalThicknessIn: 4,
    nominalWidthIn: 16,
    bIn: 3.5,
    dIn: 15.25,
    areaIn2: 53.38,
    sxIn3: 135.7,
    ixIn4: 1034,
    weightPlf: 12.97,
  },
  {
    nominal: '6x6',
    nominalThicknessIn: 6,
    nominalWidthIn: 6,
    bIn: 5.5,
    dIn: 5.5,
    areaIn2: 30.25,
    sxIn3: 27.73,
    ixIn4: 76.26,
    weightPlf: 7.352,
  },
  {
    nominal: '6x8',
    nominalThicknessIn: 6,
    nominalWidthIn: 8,
    bIn: 5.5,
    dIn: 7.5,
    areaIn2: 41.25,
    sxIn3: 51.56,
    ixIn4: 193.4,
    weightPlf: 10.03,
  },
  {
    nominal: '6x10',
    nominalThicknessIn: 6,
    nominalWidthIn: 10,
    bIn: 5.5,
    dIn: 9.5,
    areaIn2: 52.25,
    sxIn3: 82.73,
    ixIn4: 393.0,
    weightPlf: 12.7,
  },
  {
    nominal: '6x12',
    nominalThicknessIn: 6,
    nominalWidthIn: 12,
    bIn: 5.5,
    dIn: 11.5,
    areaIn2: 63.25,
    sxIn3: 121.2,
    ixIn4: 697.1,
    weightPlf: 15.37,
  },
] as const satisfies readonly DressedLumberRow[];
