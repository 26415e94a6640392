import { formatFtIn, formatIn, formatNumber, formatNumberTrimmed } from '@/lib/format';

/** How a line of a version comparison reads: a value that changed, or one only the newer or older has. */
export type DiffKind = 'changed' | 'added' | 'removed';

/** One field of a version comparison, named in words, its values formatted as the app shows them. */
export interface DiffLine {
  field: string;
  /** The older version's value; null when it had none (an added item or field). */
  before: string | null;
  /** The newer version's value; null when it has none (a removed item or field). */
  after: string | null;
  kind: DiffKind;
}

/** A field to compare: its name in words and how to read its display text from the thing (null = none). */
export type Field<T> = readonly [label: string, read: (item: T) => string | null];

const kindOf = (before: string | null, after: string | null): DiffKind =>
  before === null ? 'added' : after === null ? 'removed' : 'changed';

/**
 * The lines where two things read differently, field by field; a missing thing (null) reads as no value, so
 * comparing against null lists everything the other side has as added or removed.
 */
export function compareFields<T>(
  fields: readonly Field<T>[],
  before: T | null,
  after: T | null,
  prefix = '',
): DiffLine[] {
  const lines: DiffLine[] = [];
  for (const [label, read] of fields) {
    const was = before === null ? null : read(before);
    const now = after === null ? null : read(after);
    if (was === now) continue;
    lines.push({
      field: prefix ? `${prefix}: ${label}` : label,
      before: was,
      after: now,
      kind: kindOf(was, now),
    });
  }
  return lines;
}

/** Whole-item lines: one line per item only one side has, and the item's field changes where both have it. */
export function compareKeyed<T>(
  before: ReadonlyMap<string, T>,
  after: ReadonlyMap<string, T>,
  name: (item: T) => string,
  describe: (item: T) => string,
  fields: readonly Field<T>[],
): DiffLine[] {
  const lines: DiffLine[] = [];
  for (const [key, item] of after) {
    const old = before.get(key);
    if (old === undefined)
      lines.push({ field: name(item), before: null, after: describe(item), kind: 'added' });
    else lines.push(...compareFields(fields, old, item, name(item)));
  }
  for (const [key, item] of before)
    if (!after.has(key))
      lines.push({ field: name(item), before: describe(item), after: null, kind: 'removed' });
  return lines;
}

const present = <V>(value: V | null | undefined, format: (v: V) => string): string | null =>
  value === null || value === undefined ? null : format(value);

/** A length given in ft, shown in ft-in to 1/16 in. */
export const ftText = (ft: number | null | undefined) => present(ft, (v) => formatFtIn(v * 12));
/** A length given in in, shown in in to 1/16 in. */
export const inText = (inches: number | null | undefined) => present(inches, formatIn);
export const psfText = (psf: number | null | undefined) =>
  present(psf, (v) => `${formatNumberTrimmed(v, 2)} psf`);
export const plfText = (plf: number | null | undefined) =>
  present(plf, (v) => `${formatNumberTrimmed(v, 1)} plf`);
export const lbText = (lb: number | null | undefined) => present(lb, (v) => `${formatNumber(v)} lb`);
export const numberText = (value: number | null | undefined, unit = '') =>
  present(value, (v) => `${formatNumberTrimmed(v, 3)}${unit ? ` ${unit}` : ''}`);
export const yesNo = (value: boolean | null | undefined, yes = 'Yes', no = 'No') =>
  present(value, (v) => (v ? yes : no));
/** Free text: an empty string is no value. */
export const text = (value: string | null | undefined) => (value ? value : null);
/** A catalogue id ("douglas-fir-larch-no2") in words, for ids the snapshot has no label for. */
export const idText = (id: string | null | undefined) => present(id, (v) => v.replace(/[-_]+/g, ' '));
