import type { LoadPathElementResult } from '@/shared/schemas/calc/load-path';
import type { MemberState, MemberSummary } from '@/shared/schemas/members';

/**
 * A member's state on the job page from its own check and its place on the load path: a failing member
 * fails (its own check, or the load path's check of it with what lands on it from above); otherwise it is
 * "load path open" until its chain is closed, and its own state after that. Never "passes" on an open path.
 * @example memberStateOnPath({ state: 'passes', checkState: 'passes', … }, { checkState: 'passes', closed: false, … }) // 'load-path-open'
 */
export function memberStateOnPath(
  summary: Pick<MemberSummary, 'state' | 'checkState'>,
  onPath: Pick<LoadPathElementResult, 'checkState' | 'closed'>,
): MemberState {
  const own = summary.checkState ?? (summary.state === 'load-path-open' ? 'passes' : summary.state);
  if (own === 'fails' || onPath.checkState === 'fails') return 'fails';
  return onPath.closed ? own : 'load-path-open';
}
