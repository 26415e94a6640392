// Starts the whole product: exports the web app when needed, then runs the API server, which serves it,
// migrates the SQLite database, seeds the demo firm on first start and runs the local mail fake.
import { spawn, spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { buildServiceWorker } from './build-service-worker.mjs';

if (!existsSync('dist/index.html') || process.env.REBUILD_WEB === '1') {
  console.log('Exporting the web app (first start takes about a minute)…');
  const build = spawnSync('npx', ['expo', 'export', '--platform', 'web', '--output-dir', 'dist'], {
    stdio: 'inherit',
    env: { ...process.env, CI: '1' },
  });
  if (build.status !== 0) process.exit(build.status ?? 1);
  await buildServiceWorker('dist');
}

const server = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], { stdio: 'inherit' });
for (const signal of ['SIGINT', 'SIGTERM']) process.on(signal, () => server.kill(signal));
server.on('exit', (code) => process.exit(code ?? 0));
