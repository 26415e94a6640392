import { sql } from 'drizzle-orm';
import { afterEach, describe, expect, it } from 'vitest';
import { openDatabase, type OpenedDatabase } from '@/db/client';
import { migrateDatabase } from '@/db/migrate';

let database: OpenedDatabase | undefined;
afterEach(() => database?.close());

describe('migrations', () => {
  it('build every table on a fresh database, with foreign keys enforced, and run again as a no-op', () => {
    database = openDatabase(':memory:');
    migrateDatabase(database.db);
    migrateDatabase(database.db);
    const tables = database.db
      .all<{ name: string }>(sql`select name from sqlite_master where type = 'table' order by name`)
      .map((row) => row.name)
      .filter((name) => !name.startsWith('__drizzle') && !name.startsWith('sqlite_'));
    expect(tables).toEqual([
      'audit_events',
      'invitations',
      'jobs',
      'mail_outbox',
      'memberships',
      'organizations',
      'sessions',
      'users',
    ]);
    expect(database.db.get<{ foreign_keys: number }>(sql`pragma foreign_keys`)).toEqual({ foreign_keys: 1 });
    const orphan = () =>
      database?.db.run(
        sql`insert into memberships (id, user_id, org_id, role, created_at) values ('m', 'no-user', 'no-org', 'owner', 'now')`,
      );
    expect(orphan).toThrow(
      expect.objectContaining({ cause: expect.objectContaining({ code: 'SQLITE_CONSTRAINT_FOREIGNKEY' }) }),
    );
  });
});
