import { availableParallelism } from 'node:os';
import { join } from 'node:path';
import { Piscina } from 'piscina';
import { CalcInputError } from '@/lib/calc';
import { AppError } from '@/server/app-error';
import type { CalcTaskAnswer } from './calc-tasks';

/** Tasks waiting beyond the running ones; more than this answers 429 rather than queueing without end. */
const MAX_QUEUE = 32;

let pool: Piscina | undefined;

/**
 * One pool of worker threads per process for the heavy calculations (a full shortlist or span table takes
 * 100–300 ms, and must not hold the event loop that answers everyone else). Its threads number one fewer
 * than the cores (at least one); beyond `minThreads` they end after a minute idle.
 */
function calcPool(minThreads = 0): Piscina {
  pool ??= new Piscina({
    filename: join(__dirname, 'calc-worker.cjs'),
    minThreads,
    maxThreads: Math.max(1, availableParallelism() - 1),
    idleTimeout: 60_000,
    maxQueue: MAX_QUEUE,
  });
  return pool;
}

/**
 * Starts the pool with one thread kept ready, which loads the engine at once: the server calls this at
 * start so the first heavy request does not wait seconds for a thread. Without it (tests) the pool starts
 * with the first heavy request.
 */
export function startCalcPool(): void {
  calcPool(1);
}

/** Runs a task of calc-tasks.ts in the pool; the answer is the result as JSON text. */
export async function runInPool(task: 'shortlist' | 'spanTable', input: unknown): Promise<string> {
  let answer: CalcTaskAnswer;
  try {
    answer = await calcPool().run(input, { name: task });
  } catch (error) {
    if (error instanceof Error && /queue is at limit/i.test(error.message)) {
      throw new AppError('rate_limited', 'The calculation service is busy: try again in a moment');
    }
    throw error;
  }
  if (!answer.ok) throw new CalcInputError(answer.field, answer.message);
  return answer.json;
}
