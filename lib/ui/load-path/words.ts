import type { IconName } from '@/lib/ui/icon';
import type { LoadPathEnd, LoadPathElementKind, LoadPathState } from '@/shared/schemas/calc/load-path';

/** Each element kind as a person on site names it. */
export const kindWords: Record<LoadPathElementKind, string> = {
  member: 'New member',
  girder: 'Girder or beam (existing)',
  joist: 'Floor joist (existing)',
  wall: 'Jack studs in a wall',
  post: 'Post',
  'steel-column': 'Steel column',
  pier: 'Pier',
  footing: 'Footing',
  'foundation-wall': 'Foundation wall',
  slab: 'Concrete slab (not a footing)',
};

export const endWords: Record<LoadPathEnd, string> = {
  left: 'Left end',
  centre: 'Centre support',
  right: 'Right end',
  bottom: 'Bottom',
};

/** An element's state on the load path in words and an icon (never colour alone). */
export const pathStateLook: Record<LoadPathState, { word: string; icon: IconName; tone: 'ink' | 'danger' }> =
  {
    passes: { word: 'Passes — load path closed', icon: 'check', tone: 'ink' },
    fails: { word: 'Fails under the load', icon: 'error', tone: 'danger' },
    'engineer-required': { word: 'Engineer required', icon: 'warning', tone: 'danger' },
    'load-path-open': { word: 'Load path open', icon: 'warning', tone: 'danger' },
  };

/** How a load crosses floor framing, for the follow-up question. */
export const throughWords = {
  direct: 'Sits right on it (no floor between)',
  'squash-blocks': 'Through the floor on squash blocks',
  'solid-blocking': 'Through the floor on solid blocking',
  nothing: 'Through the floor with nothing under it',
} as const;

/** Pounds, rounded to the nearest 10 lb, with a thousands separator. */
export function lbText(lb: number): string {
  return `${(Math.round(lb / 10) * 10).toLocaleString('en-US')} lb`;
}
