import { describe, expect, it } from 'vitest';
import { snapshotSteps } from '@/server/services/pdf/pdf-load-path';
import type { SnapshotLoadPathStep } from '@/shared/schemas/requests/snapshot';

// Invented loads: these tests are about which step an end links to, not about any value.
const load = { D: 500, L: 1000, Lr: 0, S: 0 };

function step(
  id: string,
  label: string,
  depth: number,
  ends: SnapshotLoadPathStep['ends'],
): SnapshotLoadPathStep {
  return {
    id,
    label,
    kind: depth === 0 ? 'member' : 'post',
    depth,
    state: 'load-path-open',
    closed: false,
    incoming: [],
    governing: null,
    checks: [],
    ends,
    openReasons: [],
    engineerReasons: [],
    assumptions: [],
    warnings: [],
  };
}

const end = (side: 'left' | 'right' | 'bottom', ontoLabel: string | null, ontoId?: string | null) => ({
  end: side,
  ...(ontoId === undefined ? {} : { ontoId }),
  ontoLabel,
  load,
  governingLb: 1500,
  governingCombination: 'D + L',
});

describe('the request PDF links each end of the load path to the step it bears on', () => {
  it('by id, so two steps with the same label are not confused', () => {
    const steps = [
      step('beam', 'Beam', 0, [end('left', 'Post', 'post-a'), end('right', 'Post', 'post-b')]),
      step('post-a', 'Post', 1, [end('bottom', null, null)]),
      step('post-b', 'Post', 1, [end('bottom', null, null)]),
    ];
    expect(snapshotSteps(steps)[0].ends.map((e) => e.ontoId)).toEqual(['post-a', 'post-b']);
  });

  it('by label for a package sent before ids were kept', () => {
    const steps = [
      step('beam', 'Beam', 0, [end('left', 'Left post'), end('right', 'Right post')]),
      step('post-a', 'Left post', 1, [end('bottom', null)]),
      step('post-b', 'Right post', 1, [end('bottom', null)]),
    ];
    expect(snapshotSteps(steps)[0].ends.map((e) => e.ontoId)).toEqual(['post-a', 'post-b']);
  });
});
