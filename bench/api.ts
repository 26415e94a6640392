import { fork } from 'node:child_process';
import autocannon, { type Options, type Result } from 'autocannon';
import { heaviestShortlistCase, heaviestSpanTableCase, memberCase } from './cases';
import { printTable, type Figure } from './figures';

// API benchmark (npm run bench:api): autocannon at 10 connections against a bare Express 5 handler and
// Tributary's signed-in read paths in the same run (the ratio is what counts on a shared machine), the
// member save rate, and /api/health latency while the heaviest allowed calculations run (span tables and
// shortlists, with member saves and budget reads, all of them in the worker pool). DESIGN.md §9:
// signed-in reads at 40 % or more of bare Express, p99 under 50 ms; writes at 500/s or more; no request
// holds the event loop over 50 ms. The servers run in a child process (bench/api-server.ts);
// BENCH_CPU_PROF=1 writes its CPU profile under profiles/.

const CONNECTIONS = 10;
const SECONDS = Number(process.env.BENCH_SECONDS ?? 3);
/** Bare Express and the read paths take turns this many times, so a burst of load from other jobs on the
 * machine falls on all of them alike; each figure is the median of its rounds. */
const ROUNDS = Number(process.env.BENCH_ROUNDS ?? 5);

interface LoopDelay {
  maxMs: number;
  p99Ms: number;
}

interface Ports {
  barePort: number;
  appPort: number;
}

function startServers() {
  const execArgv = ['--import', 'tsx'];
  if (process.env.BENCH_CPU_PROF) execArgv.push('--cpu-prof', '--cpu-prof-dir=profiles');
  const child = fork('bench/api-server.ts', [], { execArgv });
  const ports = new Promise<Ports>((resolve) => child.once('message', (m) => resolve(m as Ports)));
  /** The server's event-loop delay over `phase` (see bench/api-server.ts). */
  const loopDelayDuring = async <T>(phase: () => Promise<T>) => {
    child.send('loop-start');
    const answer = await phase();
    const delay = new Promise<LoopDelay>((resolve) =>
      child.once('message', (m) => resolve((m as { loopDelay: LoopDelay }).loopDelay)),
    );
    child.send('loop-stop');
    return { answer, loopDelay: await delay };
  };
  const stop = () =>
    new Promise<void>((resolve) => {
      child.once('exit', () => resolve());
      child.send('stop');
    });
  return { ports, loopDelayDuring, stop };
}

async function call(base: string, method: string, path: string, body: unknown, cookie = '') {
  const res = await fetch(`${base}${path}`, {
    method,
    headers: { 'content-type': 'application/json', ...(cookie ? { cookie } : {}) },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  if (!res.ok)
    throw new Error(`${method} ${path} answered ${res.status}: ${(await res.text()).slice(0, 200)}`);
  return res;
}

/** A signed-in person with five jobs; the first has six members. */
async function seed(base: string) {
  const person = {
    name: 'Bench Person',
    email: 'bench@example.test',
    password: 'a long bench password',
    firmName: 'Bench Firm',
    firmKind: 'contracting',
  };
  const signUp = await call(base, 'POST', '/api/auth/sign-up', person);
  const cookie = (signUp.headers.get('set-cookie') ?? '').split(';')[0];
  const jobIds: string[] = [];
  for (let i = 1; i <= 5; i++) {
    const job = await call(base, 'POST', '/api/jobs', { name: `Bench job ${i}`, stories: 2 }, cookie);
    jobIds.push(((await job.json()) as { id: string }).id);
  }
  const memberIds: string[] = [];
  for (let i = 1; i <= 6; i++) {
    const body = { label: `Beam ${i}`, input: memberCase };
    const member = await call(base, 'POST', `/api/jobs/${jobIds[0]}/members`, body, cookie);
    memberIds.push(((await member.json()) as { id: string }).id);
  }
  return { cookie, jobId: jobIds[0], memberId: memberIds[0], otherMemberId: memberIds[1] };
}

function load(options: Options): Promise<Result> {
  return autocannon({ connections: CONNECTIONS, duration: SECONDS, ...options });
}

/** One measured run; refuses a run with errors or non-2xx answers. */
async function measured(label: string, options: Options): Promise<Result> {
  const result = await load(options);
  if (result.errors || result.non2xx || result.timeouts) {
    throw new Error(
      `${label}: ${result.errors} errors, ${result.non2xx} non-2xx, ${result.timeouts} timeouts`,
    );
  }
  return result;
}

/** The median of each statistic over the rounds of one phase. */
function medianOf(results: Result[]): Result {
  const median = (pick: (r: Result) => number) => {
    const values = results.map(pick).sort((a, b) => a - b);
    return values[Math.floor(values.length / 2)];
  };
  return {
    requests: { average: median((r) => r.requests.average), p50: 0, p99: 0, max: 0 },
    latency: {
      average: median((r) => r.latency.average),
      p50: median((r) => r.latency.p50),
      p99: median((r) => r.latency.p99),
      max: median((r) => r.latency.max),
    },
    errors: 0,
    timeouts: 0,
    non2xx: 0,
  };
}

/** Warms every phase up, then runs them in turn ROUNDS times; answers each phase's median round. */
async function interleaved(phases: Record<string, Options>): Promise<Record<string, Result>> {
  const rounds: Record<string, Result[]> = {};
  for (const [label, options] of Object.entries(phases)) {
    await load({ ...options, duration: 1 });
    rounds[label] = [];
  }
  for (let round = 0; round < ROUNDS; round++) {
    for (const [label, options] of Object.entries(phases)) rounds[label].push(await measured(label, options));
  }
  return Object.fromEntries(Object.entries(rounds).map(([label, results]) => [label, medianOf(results)]));
}

const rate = (r: Result) => `${Math.round(r.requests.average)} requests/s`;
const latency = (r: Result) => `p50 ${r.latency.p50} ms, p99 ${r.latency.p99} ms, max ${r.latency.max} ms`;

export async function apiFigures(): Promise<Figure[]> {
  const servers = startServers();
  const { barePort, appPort } = await servers.ports;
  const base = `http://127.0.0.1:${appPort}`;
  try {
    const { cookie, jobId, memberId, otherMemberId } = await seed(base);
    const headers = { cookie, 'content-type': 'application/json' };

    const { bare, jobs, job, save } = await interleaved({
      bare: { url: `http://127.0.0.1:${barePort}/bare` },
      jobs: { url: `${base}/api/jobs`, headers },
      job: {
        url: base,
        headers,
        requests: [
          { method: 'GET', path: `/api/jobs/${jobId}` },
          { method: 'GET', path: `/api/jobs/${jobId}/members` },
        ],
      },
      save: {
        url: `${base}/api/members/${memberId}`,
        method: 'PATCH',
        headers,
        body: JSON.stringify({ label: 'Beam 1', wall: 'Kitchen wall', input: memberCase }),
      },
    });

    // One of each first, so the figures below are of a warm worker thread.
    await call(base, 'POST', '/api/calc/span-table', heaviestSpanTableCase, cookie);
    await call(base, 'POST', '/api/calc/shortlist', heaviestShortlistCase, cookie);
    const heavyStart = performance.now();
    await call(base, 'POST', '/api/calc/span-table', heaviestSpanTableCase, cookie);
    const oneSpanTableMs = performance.now() - heavyStart;
    const shortlistStart = performance.now();
    await call(base, 'POST', '/api/calc/shortlist', heaviestShortlistCase, cookie);
    const oneShortlistMs = performance.now() - shortlistStart;

    const saveBody = JSON.stringify({ label: 'Beam 2', input: memberCase });
    const { answer: mixed, loopDelay } = await servers.loopDelayDuring(() =>
      Promise.all([
        load({
          url: base,
          connections: 4,
          duration: 2 * SECONDS + 2,
          headers,
          requests: [
            { method: 'POST', path: '/api/calc/span-table', body: JSON.stringify(heaviestSpanTableCase) },
            { method: 'POST', path: '/api/calc/shortlist', body: JSON.stringify(heaviestShortlistCase) },
            { method: 'PATCH', path: `/api/members/${otherMemberId}`, body: saveBody },
            { method: 'GET', path: `/api/members/${otherMemberId}/budget` },
          ],
        }),
        load({ url: `${base}/api/health`, connections: 1, duration: 2 * SECONDS }),
      ]),
    );
    const [heavy, health] = mixed;
    if (heavy.non2xx || heavy.errors) throw new Error(`heavy calculations: ${heavy.non2xx} non-2xx`);

    const ratio = (r: Result) => `${((100 * r.requests.average) / bare.requests.average).toFixed(0)} %`;
    return [
      {
        task: `bare Express 5 handler, small JSON (10 connections, median of ${ROUNDS} rounds)`,
        measured: `${rate(bare)}; ${latency(bare)}`,
        target: '—',
      },
      {
        task: 'GET /api/jobs signed in, 5 jobs (turns with bare)',
        measured: `${rate(jobs)}; ${latency(jobs)}`,
        target: 'p99 < 50 ms',
      },
      { task: '  ratio to bare Express', measured: ratio(jobs), target: '≥ 40 %' },
      {
        task: 'GET a job and its 6 members, alternating (turns with bare)',
        measured: `${rate(job)}; ${latency(job)}`,
        target: 'p99 < 50 ms',
      },
      { task: '  ratio to bare Express', measured: ratio(job), target: '≥ 40 %' },
      {
        task: 'PATCH /api/members/:id (save a member, recomputed)',
        measured: `${rate(save)}; ${latency(save)}`,
        target: '≥ 500 requests/s',
      },
      {
        task: 'heaviest span table (848 sizes × 12 widths), one request',
        measured: `${oneSpanTableMs.toFixed(0)} ms`,
        target: '—',
      },
      {
        task: 'heaviest shortlist (848 sizes, 40 point loads), one request',
        measured: `${oneShortlistMs.toFixed(0)} ms`,
        target: '—',
      },
      {
        task: 'heaviest calculations, member saves and budget reads, 4 connections',
        measured: rate(heavy),
        target: '—',
      },
      {
        task: 'GET /api/health meanwhile (1 connection)',
        measured: `${rate(health)}; ${latency(health)}`,
        target: '—',
      },
      {
        task: "the server's event loop meanwhile: longest delay (p99)",
        measured: `${loopDelay.maxMs.toFixed(0)} ms (p99 ${loopDelay.p99Ms.toFixed(0)} ms)`,
        target: 'max < 50 ms',
      },
    ];
  } finally {
    await servers.stop();
  }
}

if (require.main === module) {
  apiFigures()
    .then((figures) => printTable('API (npm run bench:api)', figures))
    .catch((error: unknown) => {
      console.error(error);
      process.exit(1);
    });
}
