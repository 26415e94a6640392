import { unit } from '@/lib/calc/units/unit-math';
import { CalcInputError } from '@/lib/calc/types';
import type { LengthUnit } from '@/shared/schemas/calc/units';
import {
  DECIMAL,
  MIXED,
  mixedNumberValue,
  normalizeEntry,
  shown,
  type NumberProblem,
} from '@/lib/calc/units/number-text';

/** Unit a bare number takes in a length field ('ft' or 'in'); defined by shared/schemas/calc/units. */
export type { LengthUnit };

/** Options of parseLength: the unit of a bare number and the field's name for messages. */
export interface ParseLengthOptions {
  /** Unit of a bare number; default 'in'. */
  defaultUnit?: LengthUnit;
  /** Field name for messages ("Clear span"); default the field path. */
  label?: string;
}

const FT = String.raw`(?:'|ft\.?|feet|foot)`;
const IN = String.raw`(?:"|in\.?|inch|inches)`;

const FEET_INCHES = new RegExp(String.raw`^(${MIXED})\s*${FT}(?:\s*-?\s*(${MIXED})\s*${IN}?)?$`);
const DASH_FRACTION = new RegExp(String.raw`^(${DECIMAL}\s*-\s*\d+\s*/\s*\d+)\s*(${IN})?$`);
const DASH_FEET_INCHES = new RegExp(String.raw`^(\d+)\s*-\s*(${MIXED})\s*${IN}?$`);
/** Feet, a space, then inches as a tape reads ("13 6 3/8", "13 6"): only where a bare number means feet. */
const SPACED_FEET_INCHES = new RegExp(String.raw`^(\d+)\s+(\d+(?:\.\d*)?(?:(?:\s+|\s*-\s*)\d+\s*/\s*\d+)?)$`);
const INCHES = new RegExp(String.raw`^(${MIXED})\s*${IN}$`);
const METRIC = new RegExp(
  String.raw`^(${DECIMAL})\s*(mm|cm|m|millimet(?:er|re)s?|centimet(?:er|re)s?|met(?:er|re)s?)$`,
);
const BARE = new RegExp(String.raw`^(${MIXED})$`);

const METRIC_UNITS: Record<string, string> = { mm: 'mm', cm: 'cm', m: 'm' };

/**
 * Reads a length typed by a person and returns it in inches. Accepted: 13' 6", 13'-6 1/2", 13-6 (feet-inches),
 * 13 ft 6 in, 162 in, 162", 6 1/2", 6-1/2", 3/4", 4.1 m, 410 mm, 41 cm, and a bare number ("13.5", "6 1/2")
 * in the field's default unit. In a field whose bare numbers are feet, a tape reading written with spaces
 * ("13 6 3/8", "13 6") is feet then inches, and 13-6-3/8 is 13 ft 6-3/8 in (never 13-6). Metric goes through mathjs units (1 in = 25.4 mm exactly). Typographic
 * quotes and primes are accepted.
 *
 * @param text what the person typed
 * @param field field path for the error ("spanFt", "opening.widthIn")
 * @param options defaultUnit for bare numbers ('in' unless given), label for messages
 * @returns inches, finite and ≥ 0
 * @throws CalcInputError(field) naming the field when the text can't be read, is negative, or has 12 in or
 *   more in the inches part of a feet-inches entry
 * @example parseLength(`13' 6-1/2"`, 'spanFt') // 162.5
 * @example parseLength('13.5', 'spanFt', { defaultUnit: 'ft' }) // 162
 * Reference: US customary and SI length definitions (1 ft = 12 in, 1 in = 25.4 mm exactly).
 */
export function parseLength(text: string, field: string, options: ParseLengthOptions = {}): number {
  const label = options.label ?? field;
  const entry = normalizeEntry(text);
  const fail = (why: string): never => {
    throw new CalcInputError(field, `${label}: ${why}`);
  };
  const value = (part: string): number => {
    const read = mixedNumberValue(part.trim());
    return typeof read === 'number' ? read : fail(problemText(read, text));
  };
  if (entry === '') fail(`enter a length, e.g. 13' 6"`);
  if (entry.startsWith('-')) fail(`a length can't be negative ("${shown(text)}")`);

  let inches: number;
  let match: RegExpExecArray | null;
  if ((match = FEET_INCHES.exec(entry))) {
    inches = value(match[1]) * 12 + inchesPart(match[2], value, fail);
  } else if ((match = DASH_FRACTION.exec(entry))) {
    inches = value(match[1]) * (match[2] || options.defaultUnit !== 'ft' ? 1 : 12);
  } else if ((match = DASH_FEET_INCHES.exec(entry))) {
    inches = value(match[1]) * 12 + inchesPart(match[2], value, fail);
  } else if ((match = INCHES.exec(entry))) {
    inches = value(match[1]);
  } else if ((match = METRIC.exec(entry))) {
    const metricUnit =
      METRIC_UNITS[match[2]] ??
      (match[2].startsWith('milli') ? 'mm' : match[2].startsWith('centi') ? 'cm' : 'm');
    inches = unit(value(match[1]), metricUnit).toNumber('inch');
  } else if (options.defaultUnit === 'ft' && (match = SPACED_FEET_INCHES.exec(entry))) {
    inches = value(match[1]) * 12 + inchesPart(match[2], value, fail);
  } else if ((match = BARE.exec(entry))) {
    inches = value(match[1]) * (options.defaultUnit === 'ft' ? 12 : 1);
  } else {
    return fail(`can't read "${shown(text)}"; try 13' 6" or 162 in`);
  }
  if (!Number.isFinite(inches)) fail(`"${shown(text)}" is too large`);
  return inches;
}

function inchesPart(
  part: string | undefined,
  value: (part: string) => number,
  fail: (why: string) => never,
): number {
  if (part === undefined) return 0;
  const inches = value(part);
  if (inches >= 12) fail(`the inches part (${part.trim()}) should be under 12; write it as feet and inches`);
  return inches;
}

function problemText(problem: NumberProblem, text: string): string {
  if (problem === 'zero-denominator') return `a fraction can't have 0 below the line ("${shown(text)}")`;
  if (problem === 'improper-fraction')
    return `the fraction in "${shown(text)}" should be under 1, e.g. 6 1/2`;
  return `"${shown(text)}" is too large`;
}
