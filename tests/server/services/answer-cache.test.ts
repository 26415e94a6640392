import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { openDatabase, type OpenedDatabase } from '@/db/client';
import { migrateDatabase } from '@/db/migrate';
import { organizations } from '@/db/schema';
import { createAnswerCache } from '@/server/services/answer-cache';

// The answer cache keeps an answer's JSON only while the database's change stamp (SQLite total_changes
// and PRAGMA data_version) is the same: any write, committed or rolled back, by this connection or another,
// makes the next read compute the answer again.

const opened: OpenedDatabase[] = [];
const folders: string[] = [];

afterEach(() => {
  for (const database of opened.splice(0)) database.close();
  for (const folder of folders.splice(0)) rmSync(folder, { recursive: true, force: true });
});

function open(url: string): OpenedDatabase {
  const database = openDatabase(url);
  opened.push(database);
  return database;
}

function fileDatabase(): string {
  const folder = mkdtempSync(join(tmpdir(), 'tributary-answer-cache-'));
  folders.push(folder);
  return join(folder, 'test.sqlite');
}

const firm = (id: string) => ({
  id,
  name: `Firm ${id}`,
  kind: 'contracting' as const,
  createdAt: '2026-01-01T00:00:00.000Z',
});

/** The firms' names as the answer, counting how many times it was computed. */
function firmNames(database: OpenedDatabase) {
  const counter = { runs: 0 };
  const answer = () => {
    counter.runs += 1;
    return database.db
      .select({ name: organizations.name })
      .from(organizations)
      .all()
      .map((row) => row.name);
  };
  return { counter, answer };
}

describe('answer cache', () => {
  it('answers from the cache while nothing is written, and computes again after a write', () => {
    const database = open(':memory:');
    migrateDatabase(database.db);
    const cache = createAnswerCache(database.db);
    const { counter, answer } = firmNames(database);

    expect(JSON.parse(cache.text('firms', answer))).toEqual([]);
    expect(JSON.parse(cache.text('firms', answer))).toEqual([]);
    expect(counter.runs).toBe(1);

    database.db.insert(organizations).values(firm('a')).run();
    expect(JSON.parse(cache.text('firms', answer))).toEqual(['Firm a']);
    expect(counter.runs).toBe(2);
  });

  it('keeps answers apart by key', () => {
    const database = open(':memory:');
    migrateDatabase(database.db);
    const cache = createAnswerCache(database.db);
    expect(cache.text('one', () => ({ n: 1 }))).toBe('{"n":1}');
    expect(cache.text('two', () => ({ n: 2 }))).toBe('{"n":2}');
    expect(cache.text('one', () => ({ n: 3 }))).toBe('{"n":1}');
  });

  it('computes again after a write that was rolled back', () => {
    const database = open(':memory:');
    migrateDatabase(database.db);
    const cache = createAnswerCache(database.db);
    const { counter, answer } = firmNames(database);
    cache.text('firms', answer);
    expect(() =>
      database.db.transaction((tx) => {
        tx.insert(organizations).values(firm('b')).run();
        throw new Error('roll back');
      }),
    ).toThrow('roll back');
    expect(JSON.parse(cache.text('firms', answer))).toEqual([]);
    expect(counter.runs).toBe(2);
  });

  it('computes again after another connection commits a write', () => {
    const url = fileDatabase();
    const server = open(url);
    migrateDatabase(server.db);
    const other = open(url);
    const cache = createAnswerCache(server.db);
    const { counter, answer } = firmNames(server);

    expect(JSON.parse(cache.text('firms', answer))).toEqual([]);
    other.db.insert(organizations).values(firm('c')).run();
    expect(JSON.parse(cache.text('firms', answer))).toEqual(['Firm c']);
    expect(counter.runs).toBe(2);
  });

  it('keeps nothing when the answer throws', () => {
    const database = open(':memory:');
    migrateDatabase(database.db);
    const cache = createAnswerCache(database.db);
    expect(() =>
      cache.text('missing', () => {
        throw new Error('not found');
      }),
    ).toThrow('not found');
    expect(cache.text('missing', () => ['found now'])).toBe('["found now"]');
  });
});
