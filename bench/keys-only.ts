import { startServer } from '@/tests/helpers/start-server';
import { loadavg } from 'node:os';
import { keystrokeToResultMs } from './web-editor';

const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)];

async function main() {
  const server = await startServer();
  try {
    const rounds = Number(process.env.ROUNDS ?? 2);
    for (let r = 0; r < rounds; r++) {
      const load = loadavg()
        .map((l) => l.toFixed(2))
        .join(' ');
      const keys = await keystrokeToResultMs(server.baseUrl, 21, 4);
      console.log(
        `load ${load} | median ${median(keys).toFixed(1)} ms, best ${Math.min(...keys).toFixed(1)} | ${keys.map((k) => k.toFixed(0)).join(' ')}`,
      );
    }
  } finally {
    await server.stop();
  }
}
void main();
