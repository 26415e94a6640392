import { spawn, type ChildProcess } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

export interface RunningServer {
  baseUrl: string;
  /** The captured-mail page with its key (the server answers it from this machine only). */
  devMailUrl: string;
  /** Folder of the throwaway database (`tributary.db`). */
  dataDir: string;
  /** Everything the server printed so far. */
  output: () => string;
  /** Sends SIGTERM and resolves with the exit code; removes the data folder unless `keepData`. */
  stop: () => Promise<number | null>;
  /** Sends SIGKILL (no shutdown code runs) and resolves once the process is gone; the data stays. */
  kill: () => Promise<void>;
}

export interface StartOptions {
  /** Variables on top of the test defaults (NODE_ENV=test, demo firms, a dev mail key); undefined unsets. */
  env?: Record<string, string | undefined>;
  /** Reuse this data folder (a restart after a crash) instead of a fresh one. */
  dataDir?: string;
  /** Leave the data folder in place on `stop`. */
  keepData?: boolean;
}

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = createServer();
    probe.once('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const address = probe.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      probe.close(() => resolve(port));
    });
  });
}

/**
 * Starts the real server (`node --import tsx server/index.ts`: exported web app + API + mail fake) on a free
 * loopback port with a throwaway database and the demo firms, and resolves once it is listening.
 */
export async function startServer(options: StartOptions = {}): Promise<RunningServer> {
  const port = await freePort();
  const dataDir = options.dataDir ?? mkdtempSync(join(tmpdir(), 'tributary-run-'));
  const baseUrl = `http://127.0.0.1:${port}`;
  const devMailKey = randomBytes(18).toString('base64url');
  const server: ChildProcess = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    env: {
      ...process.env,
      NODE_ENV: 'test',
      HOST: '127.0.0.1',
      PORT: String(port),
      APP_ORIGIN: baseUrl,
      DATABASE_URL: join(dataDir, 'tributary.db'),
      SEED_DEMO: '1',
      DEV_MAIL_KEY: devMailKey,
      ...options.env,
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let log = '';
  const exited = new Promise<number | null>((resolve) => server.once('exit', resolve));
  await new Promise<void>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`server did not start:\n${log}`)), 60000);
    const onData = (chunk: Buffer) => {
      log += chunk.toString();
      if (log.includes('listening on')) {
        clearTimeout(timer);
        resolve();
      }
    };
    server.stdout?.on('data', onData);
    server.stderr?.on('data', onData);
    server.once('exit', (code) => reject(new Error(`server exited with ${code}:\n${log}`)));
  });
  return {
    baseUrl,
    devMailUrl: `${baseUrl}/dev/mail?key=${devMailKey}`,
    dataDir,
    output: () => log,
    stop: async () => {
      if (server.exitCode === null && server.signalCode === null) server.kill('SIGTERM');
      const code = await exited;
      if (!options.keepData) rmSync(dataDir, { recursive: true, force: true });
      return code;
    },
    kill: async () => {
      if (server.exitCode === null && server.signalCode === null) server.kill('SIGKILL');
      await exited;
    },
  };
}
