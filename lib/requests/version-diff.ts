import type { RequestSnapshot, SnapshotMember } from '@/shared/schemas/requests/snapshot';
import type { DiffKind, DiffLine } from './diff-fields';
import { memberSections, type MemberSectionId } from './member-diff';
import { requestSections, type RequestSectionId } from './request-diff';

export type { DiffKind, DiffLine } from './diff-fields';

export type DiffSectionId = MemberSectionId | RequestSectionId;

export const DIFF_SECTION_TITLES: Record<DiffSectionId, string> = {
  job: 'Job',
  conditions: 'Conditions',
  photos: 'Photos',
  notes: 'Notes',
  questions: 'Questions',
  span: 'Span and bearing',
  loads: 'Loads',
  material: 'Material and size',
  limits: 'Checks and limits',
  result: 'Result of the preliminary check',
};

export interface DiffSection {
  id: DiffSectionId;
  title: string;
  lines: DiffLine[];
}

/** The request's own parts, or one member (by its label): changed, or only in one of the two versions. */
export interface DiffGroup {
  key: string;
  title: string;
  kind: DiffKind;
  sections: DiffSection[];
  /** Lines in all its sections. */
  count: number;
}

export interface VersionDiff {
  fromVersion: number;
  toVersion: number;
  /** Only groups with at least one line, the request's first, then members in the newer version's order. */
  groups: DiffGroup[];
  count: number;
}

function group(
  key: string,
  title: string,
  kind: DiffKind,
  parts: Partial<Record<DiffSectionId, DiffLine[]>>,
): DiffGroup {
  const sections = (Object.entries(parts) as [DiffSectionId, DiffLine[]][])
    .filter(([, lines]) => lines.length > 0)
    .map(([id, lines]) => ({ id, title: DIFF_SECTION_TITLES[id], lines }));
  return { key, title, kind, sections, count: sections.reduce((n, s) => n + s.lines.length, 0) };
}

/** "Header H1", or "Header H1 (2)" when two members share a label, so each group names one member. */
function memberTitles(members: SnapshotMember[]): Map<string, string> {
  const titles = new Map<string, string>();
  const used = new Map<string, number>();
  for (const m of members) {
    const n = (used.get(m.label) ?? 0) + 1;
    used.set(m.label, n);
    titles.set(m.id, n > 1 ? `${m.label} (${n})` : m.label);
  }
  return titles;
}

/**
 * What changed from one sent version of a design request to another, for an engineer to read: grouped by
 * the request's own parts and by member (matched by id, named by label), then by section; each field in
 * words with its value formatted as the app shows it (lengths in ft-in, loads in psf, plf and lb, each input
 * with its flag); items only one version has are listed as added or removed. Nothing is left out.
 *
 * @example diffVersions(v1, v2).groups[0] // { title: 'Header H1', sections: [{ title: 'Span and bearing', … }] }
 */
export function diffVersions(before: RequestSnapshot, after: RequestSnapshot): VersionDiff {
  const groups: DiffGroup[] = [
    group('request', 'Job and request', 'changed', requestSections(before, after)),
  ];
  const old = new Map(before.members.map((m) => [m.id, m]));
  const now = new Set(after.members.map((m) => m.id));
  const titles = memberTitles([...after.members, ...before.members.filter((m) => !now.has(m.id))]);
  for (const m of after.members) {
    const was = old.get(m.id) ?? null;
    groups.push(group(m.id, titles.get(m.id) ?? m.label, was ? 'changed' : 'added', memberSections(was, m)));
  }
  for (const m of before.members)
    if (!now.has(m.id))
      groups.push(group(m.id, titles.get(m.id) ?? m.label, 'removed', memberSections(m, null)));
  const shown = groups.filter((g) => g.count > 0);
  return {
    fromVersion: before.version,
    toVersion: after.version,
    groups: shown,
    count: shown.reduce((n, g) => n + g.count, 0),
  };
}
