import { CalcInputError } from '@/lib/calc/types';
import { PLATE_THICKNESS_IN } from '@/lib/calc/framing/lumber';
import { pickStock, type StockPick } from '@/lib/calc/framing/stock';
import type { FramingInput } from '@/shared/schemas/calc/framing';

/** One line of the framing list: what, how many, how long each piece is (in), what to buy, a note. */
export interface FramingLine {
  item: string;
  qty: number;
  lengthIn: number;
  stock: StockPick;
  note: string;
}

/** Output of buildFramingList: the lines to cut and buy, the header length (in), warnings and notes. */
export interface FramingList {
  lines: FramingLine[];
  /** Header length: RO width plus the jacks under both ends, in. */
  headerLengthIn: number;
  warnings: string[];
  notes: string[];
}

/** Gaps above the header smaller than this (in) take blocking or shims instead of cripples. */
const SMALLEST_CRIPPLE_IN = 3;

/** Cripples at every layout position over a run: the count that covers any layout start. */
function layoutCount(runIn: number, spacingIn: number): number {
  return Math.floor(runIn / spacingIn + 1e-9) + 1;
}

function round16(inches: number): number {
  return Math.round(inches * 16) / 16;
}

/**
 * Cut list for one opening: header, jack (trimmer) studs, king studs, cripples above the header and below
 * the sill, rough sill and plates, each with the stock to buy. Lengths are rounded to 1/16 in.
 * - header length = RO width + 2 × 1.5 in × jacks per side;
 * - jack = RO top (sill height + RO height) − bottom plates (the jack stands on the bottom plate);
 * - king = wall plate height − all plates;
 * - cripples above = from the top of the header to the underside of the top plates, one at each layout
 *   position over the header, flat headers included (nailing for the wall finish; the code does not require
 *   them over a flat 2x4, IRC 2021 R602.7.4, and the note says so); below the sill (windows) from the bottom
 *   plate to the rough sill.
 *
 * @param input parsed framingInputSchema (all dimensions in inches)
 * @returns lines with qty, lengthIn (in), stock (label, length in, count), note; header length (in); warnings; notes
 * @throws CalcInputError(field) when the opening and header do not fit in the wall height
 * @example
 * buildFramingList(framingInputSchema.parse({ roughOpeningWidthIn: 38, roughOpeningHeightIn: 82.5,
 *   wallHeightIn: 97.125, header: { label: '2x8', depthIn: 7.25, plies: 2 } }))
 * // header 41 in × 2, jacks 81 in × 2, kings 92-5/8 in × 2 (precut), cripples 4-3/8 in × 3
 * Reference: common practice (jack = RO height − bottom plate; king = plate height − plates; cripples at
 * stud layout; precut studs 92-5/8 and 104-5/8 in); IRC 2021 R602.7.4 for the flat 2x4 header.
 */
export function buildFramingList(input: FramingInput): FramingList {
  const stud = input.studSize;
  const spacing = input.studSpacingIn;
  const header = input.header;
  const warnings: string[] = [];
  const notes: string[] = [];
  const lines: FramingLine[] = [];
  const add = (
    item: string,
    qty: number,
    lengthIn: number,
    stock: { precut: boolean; engineered: boolean },
    note: string,
  ) => {
    if (qty <= 0) return;
    const rounded = round16(lengthIn);
    lines.push({ item, qty, lengthIn: rounded, stock: pickStock(rounded, qty, stock), note });
  };
  const sawn = { precut: false, engineered: false };
  const studStock = { precut: true, engineered: false };

  if (input.jacksPerSide === 0 && !header.flat) {
    throw new CalcInputError(
      'jacksPerSide',
      'Jack studs: a header on edge needs at least one jack stud per side',
    );
  }
  const bottomPlatesIn = input.bottomPlates * PLATE_THICKNESS_IN;
  const topPlatesIn = input.topPlates * PLATE_THICKNESS_IN;
  const underTopPlatesIn = input.wallHeightIn - topPlatesIn;
  const kingIn = input.wallHeightIn - bottomPlatesIn - topPlatesIn;
  const openingTopIn = input.sillHeightIn + input.roughOpeningHeightIn;
  const headerTopIn = openingTopIn + header.depthIn;
  if (kingIn <= 0) {
    throw new CalcInputError('wallHeightIn', 'Wall height: the plates alone are taller than the wall');
  }
  if (headerTopIn > underTopPlatesIn + 1e-9) {
    throw new CalcInputError(
      'header.depthIn',
      `Header: its top would sit ${round16(headerTopIn - underTopPlatesIn)} in above the underside of the top ` +
        'plates; lower the opening or use a shallower member',
    );
  }
  const headerLengthIn = input.roughOpeningWidthIn + 2 * PLATE_THICKNESS_IN * input.jacksPerSide;
  const framedWidthIn = headerLengthIn + 2 * PLATE_THICKNESS_IN * input.kingsPerSide;

  add(
    `Header ${header.label}`,
    header.plies,
    headerLengthIn,
    { precut: false, engineered: header.engineered },
    header.flat
      ? 'single flat 2x4 across the opening, nailed through the kings (nonbearing wall)'
      : `${header.plies} ${header.plies === 1 ? 'ply' : 'plies'}; RO width + 1-1/2 in per jack at each end`,
  );
  add(
    `Jack studs ${stud}`,
    2 * input.jacksPerSide,
    openingTopIn - bottomPlatesIn,
    studStock,
    `${input.jacksPerSide} per side; RO height − bottom plate (common practice)`,
  );
  add(
    `King studs ${stud}`,
    2 * input.kingsPerSide,
    kingIn,
    studStock,
    `${input.kingsPerSide} per side; full height between the plates`,
  );

  const gapAboveIn = underTopPlatesIn - headerTopIn;
  if (header.flat && gapAboveIn > 0) {
    notes.push(
      'Flat 2x4 header: the code requires no cripples or blocking above it (IRC 2021 R602.7.4); they are listed at layout anyway as nailing for the wall finish (common practice).',
    );
  }
  if (gapAboveIn >= SMALLEST_CRIPPLE_IN) {
    add(
      `Cripples above header ${stud}`,
      layoutCount(headerLengthIn, spacing),
      gapAboveIn,
      studStock,
      header.flat
        ? `at the ${spacing} in stud layout over the flat header: nailing for the wall finish, not required by code (common practice)`
        : `at the ${spacing} in stud layout over the header`,
    );
  } else if (gapAboveIn > 1e-9) {
    warnings.push(
      `The ${round16(gapAboveIn)} in gap above the header is too small for cripples: fill it with flat blocking or shims.`,
    );
  }

  if (input.sillHeightIn > 0) {
    const sillPliesIn = input.sillPlies * PLATE_THICKNESS_IN;
    const lowerCrippleIn = input.sillHeightIn - bottomPlatesIn - sillPliesIn;
    if (lowerCrippleIn <= 0) {
      throw new CalcInputError(
        'sillHeightIn',
        'Sill height: too low for the bottom plate and the rough sill',
      );
    }
    add(
      `Rough sill ${stud}`,
      input.sillPlies,
      input.roughOpeningWidthIn,
      sawn,
      'flat between the jacks under the opening',
    );
    add(
      `Cripples below sill ${stud}`,
      layoutCount(input.roughOpeningWidthIn, spacing),
      lowerCrippleIn,
      studStock,
      `at the ${spacing} in stud layout under the sill`,
    );
  }

  add(
    `Bottom plate ${stud}`,
    input.bottomPlates,
    framedWidthIn,
    sawn,
    input.sillHeightIn > 0
      ? 'over the framed width; the wall plate runs on past it'
      : 'over the framed width; cut out across a door opening after the wall stands (common practice)',
  );
  add(
    `Top plates ${stud}`,
    input.topPlates,
    framedWidthIn,
    sawn,
    'over the framed width; the wall plates run on past it',
  );
  if (!header.engineered && headerLengthIn > 240) {
    warnings.push(
      'The header is longer than 20 ft stock lumber: use engineered lumber ordered to length or ask an engineer.',
    );
  }
  return { lines, headerLengthIn, warnings, notes };
}
