import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { monitorEventLoopDelay, type IntervalHistogram } from 'node:perf_hooks';
import express from 'express';
import { openDatabase } from '@/db/client';
import { migrateDatabase } from '@/db/migrate';
import { createApp } from '@/server/app';
import { startCalcPool } from '@/server/services/calc-pool';
import type { Mailer } from '@/server/services/mail/mailer';

// The servers of the API benchmark, in a process of their own so the load generator (bench/api.ts) does not
// share their event loop: a bare Express 5 handler answering a small JSON object, and Tributary's real app on
// a fresh in-memory database with its request log on (the lines are serialized, then dropped).

/** Mail the benchmark queues stays in the outbox: nothing delivers it. */
const noMail: Mailer = {
  wake: () => undefined,
  idle: () => Promise.resolve(),
  close: () => Promise.resolve(),
};

function listen(server: Server): Promise<number> {
  return new Promise((resolve) =>
    server.listen(0, '127.0.0.1', () => resolve((server.address() as AddressInfo).port)),
  );
}

async function main(): Promise<void> {
  const bare = express();
  bare.get('/bare', (_req, res) => {
    res.json({ ok: true, service: 'bare', items: [1, 2, 3] });
  });
  const database = openDatabase(':memory:');
  migrateDatabase(database.db);
  const app = createApp({
    db: database.db,
    mailer: noMail,
    appOrigin: 'http://127.0.0.1',
    log: () => undefined,
    signInLimit: { windowMs: 60_000, limit: 1_000_000 },
  });
  startCalcPool();
  const servers = [createServer(bare), createServer(app)];
  const [barePort, appPort] = await Promise.all(servers.map(listen));
  process.send?.({ barePort, appPort });
  // The server's own event-loop delay over a phase (bench/api.ts asks around the heavy mix): what a request
  // held the loop for, without the load generator's own pauses that /api/health's latency also holds.
  let loopDelay: IntervalHistogram | undefined;
  process.on('message', (message) => {
    if (message === 'loop-start') {
      loopDelay = monitorEventLoopDelay({ resolution: 5 });
      loopDelay.enable();
      return;
    }
    if (message === 'loop-stop' && loopDelay) {
      loopDelay.disable();
      const ms = (ns: number) => ns / 1e6;
      process.send?.({ loopDelay: { maxMs: ms(loopDelay.max), p99Ms: ms(loopDelay.percentile(99)) } });
      return;
    }
    if (message !== 'stop') return;
    for (const server of servers) server.closeAllConnections();
    Promise.all(servers.map((server) => new Promise((resolve) => server.close(resolve)))).then(() => {
      database.close();
      process.exit(0);
    });
  });
}

void main();
