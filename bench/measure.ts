/** Result of timing one task: median and spread of the per-call time, ms. */
export interface Timing {
  medianMs: number;
  minMs: number;
  maxMs: number;
}

/**
 * Times a task: warms it up, then runs `rounds` rounds of `perRound` calls and reports the median per-call
 * time (the median resists a busy machine better than the mean).
 */
export function measure(task: () => unknown, rounds: number, perRound: number): Timing {
  for (let i = 0; i < perRound * 3; i++) task();
  const perCall: number[] = [];
  for (let r = 0; r < rounds; r++) {
    const start = performance.now();
    for (let i = 0; i < perRound; i++) task();
    perCall.push((performance.now() - start) / perRound);
  }
  perCall.sort((a, b) => a - b);
  return {
    medianMs: perCall[Math.floor(perCall.length / 2)],
    minMs: perCall[0],
    maxMs: perCall[perCall.length - 1],
  };
}
