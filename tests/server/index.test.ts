import { spawn } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

describe('node --import tsx server/index.ts', () => {
  it('migrates, adds demo data, prints its address, serves the API and stops cleanly on SIGTERM', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'tributary-start-'));
    const child = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
      env: {
        ...process.env,
        NODE_ENV: 'test',
        PORT: '0',
        HOST: '127.0.0.1',
        DATABASE_URL: `file:${join(dir, 'db', 't.db')}`,
      },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    try {
      let output = '';
      const address = await new Promise<string>((resolve, reject) => {
        child.stdout.on('data', (chunk: Buffer) => {
          output += chunk.toString();
          const match = output.match(/Tributary listening on (http:\/\/127\.0\.0\.1:\d+)/);
          if (match) resolve(match[1]);
        });
        child.stderr.on('data', (chunk: Buffer) => (output += chunk.toString()));
        child.once('exit', (code) => reject(new Error(`exited with ${code}: ${output}`)));
      });
      const health = await fetch(`${address}/api/health`);
      expect(await health.json()).toEqual({ ok: true });
      const signIn = await fetch(`${address}/api/auth/sign-in`, {
        method: 'POST',
        headers: { 'Content-Type': 'application/json' },
        body: JSON.stringify({ email: 'owner@demo.tributary.test', password: 'tributary-demo' }),
      });
      expect(signIn.status).toBe(200);
      const exitCode = new Promise<number | null>((resolve) => child.once('exit', resolve));
      child.kill('SIGTERM');
      expect(await exitCode).toBe(0);
    } finally {
      if (child.exitCode === null) child.kill('SIGKILL');
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
