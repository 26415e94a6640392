import { LOAD_DEFAULTS } from '@/lib/calc';
import type { LoadSource, pointLoadKinds } from '@/shared/schemas/calc/loads';

export type InputFlag = 'measured' | 'assumed' | 'default';
export type SourceKind = LoadSource['kind'];
export type PointKind = (typeof pointLoadKinds)[number];

/**
 * One load source as typed. Every kind shares one shape so a source can be edited and reordered without
 * losing what was typed; member-input.ts reads only the fields of its kind.
 */
export type SourceDraft = {
  /** Stable identity for lists and reordering (not sent). */
  key: string;
  kind: SourceKind;
  label: string;
  flag: InputFlag;
  /** Where the numbers came from ("HUD RSDG Table 3.2 …"), shown under the source. */
  note: string;
  tributary: string;
  deadPsf: string;
  /** Floor or attic live load; roof live load on a roof source. */
  livePsf: string;
  deadAlongSlope: boolean;
  continuousOver: boolean;
  partial: boolean;
  start: string;
  end: string;
  wallByHeight: boolean;
  wallHeight: string;
  wallPlf: string;
  pointKind: PointKind;
  at: string;
  deadLb: string;
  liveLb: string;
  roofLiveLb: string;
  snowLb: string;
};

let nextKey = 0;
/** A key unique in this session. */
export function newSourceKey(): string {
  nextKey += 1;
  return `s${Date.now().toString(36)}${nextKey}`;
}

const blank: Omit<SourceDraft, 'key' | 'kind' | 'label'> = {
  flag: 'default',
  note: '',
  tributary: '',
  deadPsf: '',
  livePsf: '',
  deadAlongSlope: false,
  continuousOver: false,
  partial: false,
  start: '',
  end: '',
  wallByHeight: true,
  wallHeight: '8',
  wallPlf: '',
  pointKind: 'post-above',
  at: '',
  deadLb: '0',
  liveLb: '0',
  roofLiveLb: '0',
  snowLb: '0',
};

export const sourceKindLabels: Record<SourceKind, string> = {
  roof: 'Roof',
  ceiling: 'Ceiling',
  floor: 'Floor',
  'wall-above': 'Wall above',
  point: 'Point load',
};

export const pointKindLabels: Record<PointKind, string> = {
  'girder-truss': 'Girder truss',
  'hip-valley-end': 'Hip or valley end',
  'purlin-strut': 'Purlin brace or strut',
  'post-above': 'Post from above',
  'heavy-fixture': 'Heavy fixture',
};

/**
 * A new source of a kind, prefilled with the published typical values (flag "default", source named).
 * @example newSource('floor').livePsf // '40'
 */
export function newSource(kind: SourceKind): SourceDraft {
  const base = { ...blank, key: newSourceKey(), kind, label: sourceKindLabels[kind] };
  switch (kind) {
    case 'roof':
      return {
        ...base,
        deadPsf: String(LOAD_DEFAULTS.roofDead.psf),
        livePsf: String(LOAD_DEFAULTS.roofLive.psf),
        note: `${LOAD_DEFAULTS.roofDead.source}; ${LOAD_DEFAULTS.roofLive.source}`,
      };
    case 'ceiling':
      return {
        ...base,
        deadPsf: '10',
        livePsf: String(LOAD_DEFAULTS.atticLiveNoStorage.psf),
        note: `Ceiling joists, drywall and insulation 10 psf (common practice); ${LOAD_DEFAULTS.atticLiveNoStorage.source}`,
      };
    case 'floor':
      return {
        ...base,
        deadPsf: String(LOAD_DEFAULTS.floorDead.psf),
        livePsf: String(LOAD_DEFAULTS.floorLive.psf),
        note: `${LOAD_DEFAULTS.floorDead.source}; ${LOAD_DEFAULTS.floorLive.source}`,
      };
    case 'wall-above':
      return {
        ...base,
        deadPsf: String(LOAD_DEFAULTS.wallDead.psf),
        note: LOAD_DEFAULTS.wallDead.source,
      };
    case 'point':
      return { ...base, label: pointKindLabels['post-above'] };
  }
}

/** Moves the source at `from` by `step` places (−1 up, +1 down); out of range leaves the list as it is. */
export function moveSource(sources: readonly SourceDraft[], from: number, step: -1 | 1): SourceDraft[] {
  const to = from + step;
  if (from < 0 || from >= sources.length || to < 0 || to >= sources.length) return [...sources];
  const next = [...sources];
  [next[from], next[to]] = [next[to], next[from]];
  return next;
}
