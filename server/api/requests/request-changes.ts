import { diffVersions } from '@/lib/requests/version-diff';
import type { ChangeLine, RequestSnapshot } from '@/shared/schemas/requests/snapshot';

/**
 * What changed from one version to the next, as the request page words it (lib/requests/version-diff):
 * one line per field, grouped by the request's parts and by member, then by section, in that order.
 */
export function changesBetween(before: RequestSnapshot, after: RequestSnapshot): ChangeLine[] {
  return diffVersions(before, after).groups.flatMap((group) =>
    group.sections.flatMap((section) =>
      section.lines.map((line) => ({
        group: group.kind === 'changed' ? group.title : `${group.title} (${group.kind})`,
        section: section.title,
        field: line.field,
        before: line.before,
        after: line.after,
        kind: line.kind,
      })),
    ),
  );
}

/**
 * Each stored version's change list, worded: a list stored before the lists were worded (dotted paths) is
 * made again from the two snapshots, so every reader gets one shape.
 */
export function wordedChanges<V extends { snapshot: RequestSnapshot; changes: unknown[] }>(
  versions: V[],
): (V & { changes: ChangeLine[] })[] {
  return versions.map((v, i) => {
    const previous = versions[i - 1];
    const stale = v.changes.some((line) => typeof line !== 'object' || line === null || !('field' in line));
    if (!stale) return v as V & { changes: ChangeLine[] };
    return { ...v, changes: previous ? changesBetween(previous.snapshot, v.snapshot) : [] };
  });
}
