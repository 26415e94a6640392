import type { LoadSource } from '@/shared/schemas/calc/loads';
import { ftText, lbText, plfText, psfText, yesNo, type Field } from './diff-fields';

const KIND_WORDS: Record<LoadSource['kind'], string> = {
  roof: 'Roof load',
  ceiling: 'Ceiling load',
  floor: 'Floor load',
  'wall-above': 'Wall above',
  point: 'Point load',
};

const POINT_WORDS = {
  'girder-truss': 'girder truss',
  'hip-valley-end': 'hip or valley end',
  'purlin-strut': 'purlin strut',
  'post-above': 'post from above',
  'heavy-fixture': 'heavy fixture',
};

/** "Floor load (kitchen)", "Point load 2": the source's kind in words, its label or its place among its kind. */
export function loadName(source: LoadSource, n: number): string {
  const kind = KIND_WORDS[source.kind];
  if (source.label) return `${kind} (${source.label})`;
  return n > 1 ? `${kind} ${n}` : kind;
}

type Keyed = { source: LoadSource; n: number };
/** Reads one number of a source that has it (the kinds differ in their fields). */
const pick = (key: string) => (s: LoadSource) => (s as unknown as Record<string, number | undefined>)[key];

const field = (
  label: string,
  key: string,
  format: (v: number | undefined) => string | null,
): Field<Keyed> => [label, ({ source }) => format(pick(key)(source))];

/** The fields of a load source, in its units; a field the kind does not have reads as none. */
export const loadFields: Field<Keyed>[] = [
  ['kind of point load', ({ source }) => (source.kind === 'point' ? POINT_WORDS[source.pointKind] : null)],
  field('position from the left support', 'atFt', ftText),
  field('tributary width', 'tributaryFt', ftText),
  field('dead load', 'deadPsf', psfText),
  [
    'dead load given along the slope',
    ({ source }) => (source.kind === 'roof' ? yesNo(source.deadAlongSlope) : null),
  ],
  field('roof live load', 'roofLivePsf', psfText),
  field('snow load', 'snowPsf', psfText),
  field('live load', 'livePsf', psfText),
  [
    'joists continuous over the member',
    ({ source }) => ('continuousOver' in source ? yesNo(source.continuousOver) : null),
  ],
  field('line load', 'wPlf', plfText),
  field('wall height', 'heightFt', ftText),
  field('dead load', 'deadLb', lbText),
  field('live load', 'liveLb', lbText),
  field('roof live load', 'roofLiveLb', lbText),
  field('snow load', 'snowLb', lbText),
  field('starts at', 'startFt', ftText),
  field('ends at', 'endFt', ftText),
  ['flag', ({ source }) => source.flag],
];

/** One source in a line, for an added or removed load: "12' 0" wide, 10 psf dead, 40 psf live (measured)". */
export function describeLoad(source: LoadSource): string {
  const parts = loadFields
    .filter(([label]) => label !== 'flag')
    .map(([label, read]) => {
      const value = read({ source, n: 1 });
      if (value === null) return null;
      // A yes/no reads as words: "dead load given along the slope: no", never "… slope No".
      return value === 'Yes' || value === 'No' ? `${label}: ${value.toLowerCase()}` : `${label} ${value}`;
    })
    .filter((part): part is string => part !== null);
  return `${parts.join(', ')} (${source.flag})`;
}
