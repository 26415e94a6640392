import { unit } from '@/lib/calc/units/unit-math';
import { CalcInputError } from '@/lib/calc/types';
import type { LoadKind } from '@/shared/schemas/calc/units';
import { DECIMAL, normalizeEntry, shown } from '@/lib/calc/units/number-text';

/** What a load field holds ('psf', 'plf' or 'lb'); defined by shared/schemas/calc/units. */
export type { LoadKind };

/** Options of parseLoad: the field's name for messages. */
export interface ParseLoadOptions {
  /** Field name for messages ("Roof dead load"); default the field path. */
  label?: string;
}

interface LoadUnit {
  kind: LoadKind;
  /** Converts a value in this unit to psf, plf or lb. */
  toUs: (value: number) => number;
}

const asIs = (value: number) => value;
/** 1 kip = 1000 lb by definition (mathjs rounds its kip to 4448.2216 N, so it is not used for kips). */
const thousand = (value: number) => value * 1000;
const viaMathjs = (from: string, to: string) => (value: number) => unit(value, from).toNumber(to);

const UNITS: ReadonlyMap<string, LoadUnit> = new Map(
  Object.entries({
    psf: { kind: 'psf', toUs: asIs },
    'lb/ft2': { kind: 'psf', toUs: asIs },
    'lb/sf': { kind: 'psf', toUs: asIs },
    '#/sf': { kind: 'psf', toUs: asIs },
    '#/ft2': { kind: 'psf', toUs: asIs },
    ksf: { kind: 'psf', toUs: thousand },
    pa: { kind: 'psf', toUs: viaMathjs('Pa', 'lbf/ft^2') },
    kpa: { kind: 'psf', toUs: viaMathjs('kPa', 'lbf/ft^2') },
    'n/m2': { kind: 'psf', toUs: viaMathjs('N/m^2', 'lbf/ft^2') },
    'kn/m2': { kind: 'psf', toUs: viaMathjs('kN/m^2', 'lbf/ft^2') },
    plf: { kind: 'plf', toUs: asIs },
    'lb/ft': { kind: 'plf', toUs: asIs },
    'lb/lf': { kind: 'plf', toUs: asIs },
    '#/ft': { kind: 'plf', toUs: asIs },
    '#/lf': { kind: 'plf', toUs: asIs },
    klf: { kind: 'plf', toUs: thousand },
    'kip/ft': { kind: 'plf', toUs: thousand },
    'k/ft': { kind: 'plf', toUs: thousand },
    'n/m': { kind: 'plf', toUs: viaMathjs('N/m', 'lbf/ft') },
    'kn/m': { kind: 'plf', toUs: viaMathjs('kN/m', 'lbf/ft') },
    lb: { kind: 'lb', toUs: asIs },
    '#': { kind: 'lb', toUs: asIs },
    pound: { kind: 'lb', toUs: asIs },
    kip: { kind: 'lb', toUs: thousand },
    k: { kind: 'lb', toUs: thousand },
    n: { kind: 'lb', toUs: viaMathjs('N', 'lbf') },
    kn: { kind: 'lb', toUs: viaMathjs('kN', 'lbf') },
  } satisfies Record<string, LoadUnit>),
);

const KIND_TEXT: Record<LoadKind, { name: string; example: string }> = {
  psf: { name: 'an area load in psf', example: '15 psf or 0.7 kPa' },
  plf: { name: 'a line load in plf (lb per ft)', example: '120 plf or 1.8 kN/m' },
  lb: { name: 'a point load in lb', example: '1,500 lb or 2.5 kip' },
};

const ENTRY = new RegExp(String.raw`^(${DECIMAL})\s*(.*)$`);

/** Unit text in a canonical spelling: "lbs per sq. ft" → "lb/ft2", "kN/m²" → "kn/m2", "kips" → "kip". */
function canonicalUnit(text: string): string {
  return text
    .replace(/\bper\b/g, '/')
    .replace(/[\s.]+/g, '')
    .replace(/\^2|²/g, '2')
    .replace(/lbs/g, 'lb')
    .replace(/pounds/g, 'pound')
    .replace(/kips/g, 'kip')
    .replace(/feet|foot/g, 'ft')
    .replace(/squareft|sqft/g, 'ft2');
}

/**
 * Reads a load typed by a person and returns it in the field's US unit. Area loads: psf, lb/ft², ksf, kPa,
 * Pa, kN/m². Line loads: plf, lb/ft, klf, kip/ft, kN/m, N/m. Point loads: lb, lbs, #, kip, kN, N. A bare
 * number takes the field's unit. Metric goes through mathjs units (lbf = 0.45359237 kg × 9.80665 m/s²,
 * 1 ft = 0.3048 m exactly); 1 kip = 1000 lb.
 *
 * @param text what the person typed ("1,500 lb", "2.4 kN/m")
 * @param field field path for the error
 * @param expected the field's kind: 'psf', 'plf' or 'lb'
 * @param options label for messages
 * @returns psf, plf or lb (per `expected`), finite and ≥ 0
 * @throws CalcInputError(field) when the text can't be read, is negative, or is a different kind of load
 * @example parseLoad('2.5 kip', 'posts.0.deadLb', 'lb') // 2500
 * @example parseLoad('1 kPa', 'roof.deadPsf', 'psf') // 20.885…
 * Reference: ASTM/NIST SI conversion definitions (pound-force, foot); 1 kip = 1000 lbf.
 */
export function parseLoad(
  text: string,
  field: string,
  expected: LoadKind,
  options: ParseLoadOptions = {},
): number {
  const label = options.label ?? field;
  const fail = (why: string): never => {
    throw new CalcInputError(field, `${label}: ${why}`);
  };
  const entry = normalizeEntry(text);
  if (entry === '') fail(`enter ${KIND_TEXT[expected].name}, e.g. ${KIND_TEXT[expected].example}`);
  if (entry.startsWith('-')) fail(`a load can't be negative ("${shown(text)}")`);
  const match = ENTRY.exec(entry);
  if (!match) return fail(`can't read "${shown(text)}"; try ${KIND_TEXT[expected].example}`);
  const unitText = canonicalUnit(match[2]);
  const loadUnit = UNITS.get(unitText === '' ? expected : unitText);
  if (!loadUnit) return fail(`can't read the unit in "${shown(text)}"; try ${KIND_TEXT[expected].example}`);
  if (loadUnit.kind !== expected) {
    return fail(
      `"${shown(text)}" is ${KIND_TEXT[loadUnit.kind].name}; this field takes ${KIND_TEXT[expected].name}`,
    );
  }
  const value = loadUnit.toUs(Number(match[1]));
  if (!Number.isFinite(value)) fail(`"${shown(text)}" is too large`);
  return value;
}
