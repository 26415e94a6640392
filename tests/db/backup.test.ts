import { spawn } from 'node:child_process';
import { mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import { afterEach, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '@/db/seed';
import { startServer, type RunningServer } from '@/tests/helpers/start-server';

const folders: string[] = [];
const tempFolder = (name: string) => {
  const dir = mkdtempSync(join(tmpdir(), `tributary-${name}-`));
  folders.push(dir);
  return dir;
};
afterEach(() => {
  for (const dir of folders.splice(0)) rmSync(dir, { recursive: true, force: true });
});

/**
 * `npm run backup` / `npm run restore` as a person runs them, against the given data folder (without
 * blocking this process, whose writer keeps writing meanwhile).
 */
function script(name: 'backup' | 'restore', dataDir: string, folder: string) {
  const child = spawn('npm', ['run', '--silent', name, '--', folder], {
    env: {
      ...process.env,
      DATABASE_URL: join(dataDir, 'tributary.db'),
      STORAGE_DIR: join(dataDir, 'storage'),
    },
  });
  let stderr = '';
  child.stderr.on('data', (chunk: Buffer) => (stderr += chunk.toString()));
  return new Promise<{ status: number | null; stderr: string }>((resolve) =>
    child.once('exit', (status) => resolve({ status, stderr })),
  );
}

async function signInCookie(server: RunningServer): Promise<string> {
  const res = await fetch(`${server.baseUrl}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email: 'owner@demo.tributary.test', password: DEMO_PASSWORD }),
  });
  return (res.headers.getSetCookie().find((c) => c.startsWith('tributary_session=')) ?? '').split(';')[0];
}

describe('npm run backup and npm run restore', () => {
  it('a backup taken under writes restores with everything acknowledged before it', async () => {
    const live = tempFolder('live');
    mkdirSync(join(live, 'storage', 'photos'), { recursive: true });
    writeFileSync(join(live, 'storage', 'photos', 'wall.jpg'), 'not really a photo');
    const server = await startServer({ dataDir: live, keepData: true });
    const cookie = await signInCookie(server);
    const acknowledged: string[] = [];
    let writing = true;
    let sent = 0;
    const writer = (async () => {
      while (writing && sent < 5000) {
        sent += 1;
        const res = await fetch(`${server.baseUrl}/api/jobs`, {
          method: 'POST',
          headers: { 'Content-Type': 'application/json', Cookie: cookie },
          body: JSON.stringify({ name: `Written during the backup ${sent}` }),
        });
        if (res.status === 201) acknowledged.push(((await res.json()) as { id: string }).id);
      }
    })();
    try {
      while (acknowledged.length < 20) await new Promise((resolve) => setTimeout(resolve, 20));
      const beforeBackup = [...acknowledged];
      const backup = join(tempFolder('backups'), 'one');
      const made = await script('backup', live, backup);
      expect(made.status, made.stderr).toBe(0);
      const afterBackup = acknowledged.length;
      writing = false;
      await writer;
      expect(afterBackup, 'writes went on while the backup ran').toBeGreaterThan(beforeBackup.length);
      const manifest = JSON.parse(readFileSync(join(backup, 'manifest.json'), 'utf8'));
      expect(manifest).toMatchObject({ database: 'tributary.db', storage: true, integrity: 'ok' });

      const restored = tempFolder('restored');
      writeFileSync(join(restored, 'tributary.db-wal'), 'a stale write-ahead log that must not be replayed');
      const put = await script('restore', restored, backup);
      expect(put.status, put.stderr).toBe(0);
      expect(readFileSync(join(restored, 'storage', 'photos', 'wall.jpg'), 'utf8')).toBe(
        'not really a photo',
      );

      const db = new Database(join(restored, 'tributary.db'), { readonly: true });
      try {
        expect(db.pragma('integrity_check', { simple: true })).toBe('ok');
        const ids = new Set(db.prepare('SELECT id FROM jobs').pluck().all() as string[]);
        expect(beforeBackup.filter((id) => !ids.has(id))).toEqual([]);
      } finally {
        db.close();
      }
      const again = await startServer({ dataDir: restored, keepData: true });
      try {
        const res = await fetch(`${again.baseUrl}/api/jobs`, {
          headers: { Cookie: await signInCookie(again) },
        });
        const listed = new Set(((await res.json()) as { jobs: { id: string }[] }).jobs.map((job) => job.id));
        expect(beforeBackup.filter((id) => !listed.has(id))).toEqual([]);
      } finally {
        await again.stop();
      }
    } finally {
      writing = false;
      await writer;
      await server.stop();
    }
  }, 90_000);

  it('refuses an existing target folder and a folder that is not a finished backup', async () => {
    const live = tempFolder('empty-live');
    const taken = tempFolder('taken');
    expect((await script('backup', live, taken)).stderr).toMatch(/exists already/);
    const notBackup = tempFolder('not-a-backup');
    const refused = await script('restore', live, notBackup);
    expect(refused.status).toBe(1);
    expect(refused.stderr).toMatch(/no manifest\.json: not a finished backup/);
  });
});
