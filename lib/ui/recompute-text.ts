import type { JobLoadContextField, MemberRecompute } from '@/shared/schemas/job-update';
import type { MemberState } from '@/shared/schemas/members';

const FIELD_WORDS: Record<JobLoadContextField, string> = {
  loadStandard: 'load standard',
  groundSnowPsf: 'ground snow',
  roofType: 'roof type',
  roofPitchIn12: 'roof slope',
  buildingWidthFt: 'building width',
};

const STATE_WORDS: Record<MemberState, string> = {
  passes: 'passes',
  fails: 'fails',
  'engineer-needed': 'needs an engineer',
  'load-path-open': 'has an open load path',
};

/** What a job save did to its members, in words: a heading, a line per member whose state changed, a tail. */
export interface RecomputeText {
  title: string;
  changed: string[];
  unchanged: string | null;
}

/**
 * The job page's note after a save that checked members again: which members changed state and how, and
 * how many were checked again without a change.
 * @example recomputeText([{ label: 'Kitchen doorway', before: 'passes', after: 'fails', fields: ['groundSnowPsf'], … }]).changed[0] // "Kitchen doorway: passed, now fails (ground snow)"
 */
export function recomputeText(recomputed: readonly MemberRecompute[]): RecomputeText | null {
  if (recomputed.length === 0) return null;
  const moved = recomputed.filter((r) => r.before !== r.after);
  const still = recomputed.length - moved.length;
  const changed = moved.map(
    (r) =>
      `${r.label}: ${STATE_WORDS[r.before]} before, now ${STATE_WORDS[r.after]} (${r.fields.map((f) => FIELD_WORDS[f]).join(', ')})`,
  );
  const members = (n: number) => (n === 1 ? '1 member' : `${n} members`);
  return {
    title:
      moved.length > 0
        ? `${members(moved.length)} changed state with the job's new values`
        : `${members(recomputed.length)} checked again with the job's new values`,
    changed,
    unchanged:
      still === 0
        ? null
        : moved.length > 0
          ? `${still} more ${still === 1 ? 'member' : 'members'} checked again, state unchanged.`
          : 'None changed state.',
  };
}
