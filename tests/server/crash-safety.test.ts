import Database from 'better-sqlite3';
import { rmSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '@/db/seed';
import { SAMPLE_HEADER } from '@/tests/helpers/sample-bodies';
import { startServer, type RunningServer } from '@/tests/helpers/start-server';

/** Writes in flight at once, and the bounds that make the burst stop by itself. */
const IN_FLIGHT = 16;
const MAX_REQUESTS = 3000;
const KILL_AFTER_ACKS = 60;

async function signInCookie(server: RunningServer): Promise<string> {
  const res = await fetch(`${server.baseUrl}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email: 'owner@demo.tributary.test', password: DEMO_PASSWORD }),
  });
  expect(res.status).toBe(200);
  return (res.headers.getSetCookie().find((c) => c.startsWith('tributary_session=')) ?? '').split(';')[0];
}

interface Acknowledged {
  jobs: string[];
  members: string[];
  /** Requests the kill cut off before their answer. */
  cutOff: number;
}

/**
 * Creates jobs and saves members on them from IN_FLIGHT loops until `stop()` says so; a write counts as
 * acknowledged only once its 201 has arrived.
 */
function burst(server: RunningServer, cookie: string, onAck: (acks: Acknowledged) => void) {
  const acks: Acknowledged = { jobs: [], members: [], cutOff: 0 };
  let sent = 0;
  let stopped = false;
  const post = async (path: string, body: unknown) => {
    const res = await fetch(`${server.baseUrl}${path}`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json', Cookie: cookie },
      body: JSON.stringify(body),
    });
    return res.status === 201 ? ((await res.json()) as { id: string }) : undefined;
  };
  const loop = async (lane: number) => {
    while (!stopped && sent < MAX_REQUESTS) {
      sent += 1;
      try {
        const job = await post('/api/jobs', { name: `Burst job ${lane}-${sent}` });
        if (!job) continue;
        acks.jobs.push(job.id);
        onAck(acks);
        const member = await post(`/api/jobs/${job.id}/members`, {
          label: `Burst member ${sent}`,
          input: SAMPLE_HEADER,
        });
        if (member) acks.members.push(member.id);
        onAck(acks);
      } catch {
        // The server was killed mid-request: this write was never acknowledged.
        acks.cutOff += 1;
      }
    }
  };
  const done = Promise.all(Array.from({ length: IN_FLIGHT }, (_, lane) => loop(lane)));
  return { acks, done, stop: () => (stopped = true) };
}

describe('crash safety', () => {
  it('a SIGKILL in the middle of a burst of writes loses no acknowledged write and leaves the database whole', async () => {
    const first = await startServer({ keepData: true });
    const { dataDir } = first;
    try {
      const cookie = await signInCookie(first);
      let killing: Promise<void> | undefined;
      const run = burst(first, cookie, (acks) => {
        if (!killing && acks.jobs.length >= KILL_AFTER_ACKS) killing = first.kill();
      });
      await run.done.finally(run.stop);
      await killing;
      expect(run.acks.jobs.length).toBeGreaterThanOrEqual(KILL_AFTER_ACKS);
      expect(run.acks.cutOff, 'writes were in flight when the server died').toBeGreaterThan(0);

      const second = await startServer({ dataDir, keepData: true });
      try {
        const db = new Database(join(dataDir, 'tributary.db'), { readonly: true });
        try {
          expect(db.pragma('integrity_check', { simple: true })).toBe('ok');
          expect(db.pragma('foreign_key_check')).toEqual([]);
          const jobIds = new Set(db.prepare('SELECT id FROM jobs').pluck().all() as string[]);
          const memberIds = new Set(db.prepare('SELECT id FROM members').pluck().all() as string[]);
          expect(run.acks.jobs.filter((id) => !jobIds.has(id))).toEqual([]);
          expect(run.acks.members.filter((id) => !memberIds.has(id))).toEqual([]);
        } finally {
          db.close();
        }
        const again = await signInCookie(second);
        const list = await fetch(`${second.baseUrl}/api/jobs`, { headers: { Cookie: again } });
        const listed = new Set(((await list.json()) as { jobs: { id: string }[] }).jobs.map((job) => job.id));
        expect(run.acks.jobs.filter((id) => !listed.has(id))).toEqual([]);
      } finally {
        await second.stop();
      }
    } finally {
      await first.kill();
      rmSync(dataDir, { recursive: true, force: true });
    }
  }, 60_000);
});
