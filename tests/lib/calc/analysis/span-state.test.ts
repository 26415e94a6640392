import { describe, it } from 'vitest';
import {
  combineStates,
  emptySpanState,
  simpleSpanBreakpoints,
  simpleSpanState,
  stateMaxEiDeflection,
  stateMaxMoment,
} from '@/lib/calc/analysis';
import type { BeamLoad } from '@/lib/calc/types';
import { expectApprox } from '@/tests/helpers/approx';

describe('combineStates (superposition)', () => {
  it('a weighted sum of load-group states equals the state of the weighted loads', () => {
    const l = 14;
    const dead: BeamLoad[] = [{ kind: 'uniform', wPlf: 150 }];
    const live: BeamLoad[] = [
      { kind: 'uniform', wPlf: 400, startFt: 2, endFt: 9 },
      { kind: 'point', pLb: 1800, atFt: 10.5 },
    ];
    const xs = simpleSpanBreakpoints(l, [dead, live]);
    const combined = combineStates(
      emptySpanState(l, xs),
      [simpleSpanState(l, dead, xs), simpleSpanState(l, live, xs)],
      [1, 0.75],
    );
    const direct = simpleSpanState(l, [
      { kind: 'uniform', wPlf: 150 },
      { kind: 'uniform', wPlf: 300, startFt: 2, endFt: 9 },
      { kind: 'point', pLb: 1350, atFt: 10.5 },
    ]);
    // AWC Design Aid No. 6: beam responses superpose linearly.
    expectApprox(stateMaxMoment(combined).value, stateMaxMoment(direct).value, { rel: 1e-12 });
    expectApprox(stateMaxMoment(combined).atFt, stateMaxMoment(direct).atFt, { rel: 1e-12 });
    expectApprox(stateMaxEiDeflection(combined).value, stateMaxEiDeflection(direct).value, { rel: 1e-10 });
    expectApprox(combined.reactionsLb[1], direct.reactionsLb[1], { rel: 1e-12 });
  });
});
