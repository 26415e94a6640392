import { requestWorld } from '@/tests/helpers/design-requests';
import { createTestServer } from '@/tests/helpers/server';
import { startCalcPool } from '@/server/services/calc-pool';
import type { Figure } from './figures';

// The design request's PDF package (npm run bench): a sent request of the test world (one header with its
// load path, the engineer's view) downloaded in turn, each answer timed from request to last byte. The PDF
// is built in the calculation pool, so this is the time a person waits, not time on the event loop.

const RUNS = Number(process.env.BENCH_PDF_RUNS ?? 15);

const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)];

export async function pdfFigures(): Promise<Figure[]> {
  startCalcPool();
  const server = await createTestServer();
  try {
    const world = await requestWorld(server);
    const id = await world.sent();
    const path = `/api/requests/${id}/package.pdf`;
    // One first, so the figure is of a warm worker thread and fonts already read.
    const first = await world.engineer.agent.get(path).buffer(true).expect(200);
    const times: number[] = [];
    for (let i = 0; i < RUNS; i++) {
      const start = performance.now();
      await world.engineer.agent.get(path).buffer(true).expect(200);
      times.push(performance.now() - start);
    }
    return [
      {
        task: `design request PDF package (1 header, ${Math.round(first.body.length / 1000)} KB), one download`,
        measured: `${median(times).toFixed(0)} ms median of ${RUNS} (best ${Math.min(...times).toFixed(0)} ms)`,
        target: '—',
      },
    ];
  } finally {
    await server.close();
  }
}
