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
 * One pool of worker threads per process for the heavy work (a full shortlist or span table takes 100–300 ms;
 * a member save's check with its diagrams, a budget read and a design request's PDF take tens of
 * milliseconds each), which must not hold the event loop that answers everyone else. Its threads number one fewer
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

type Tasks = typeof import('./calc-tasks');

/** Runs a task of calc-tasks.ts in the pool by name; a full queue answers 429 (rate_limited). */
export async function runTask<K extends keyof Tasks>(
  task: K,
  input: Parameters<Tasks[K]>[0],
): Promise<Awaited<ReturnType<Tasks[K]>>> {
  try {
    return (await calcPool().run(input, { name: task })) as Awaited<ReturnType<Tasks[K]>>;
  } catch (error) {
    if (error instanceof Error && /queue is at limit/i.test(error.message)) {
      throw new AppError('rate_limited', 'The calculation service is busy: try again in a moment');
    }
    throw error;
  }
}

type AnsweringTask = {
  [K in keyof Tasks]: ReturnType<Tasks[K]> extends CalcTaskAnswer<unknown> ? K : never;
}[keyof Tasks];

/**
 * Runs an engine task of calc-tasks.ts in the pool and answers its value; the engine's input error comes
 * back as the CalcInputError it was in the thread, naming the same field with the same message.
 */
export async function runInPool<K extends AnsweringTask>(
  task: K,
  input: Parameters<Tasks[K]>[0],
): Promise<Extract<ReturnType<Tasks[K]>, { ok: true }>['value']> {
  const answer = (await runTask(task, input)) as CalcTaskAnswer<unknown>;
  if (!answer.ok) throw new CalcInputError(answer.field, answer.message);
  return answer.value as Extract<ReturnType<Tasks[K]>, { ok: true }>['value'];
}
