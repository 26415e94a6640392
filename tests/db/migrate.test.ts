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
      'attachments',
      'audit_events',
      'auth_tokens',
      'bearing_screen_versions',
      'bearing_screens',
      'design_request_versions',
      'design_requests',
      'engineer_replies',
      'idempotency_keys',
      'invitations',
      'job_checklist_items',
      'job_engineer_items',
      'jobs',
      'load_path_bearings',
      'load_path_elements',
      'mail_outbox',
      'member_budgets',
      'members',
      'memberships',
      'organizations',
      'price_book_settings',
      'price_items',
      'request_invitations',
      'request_messages',
      'sent_budgets',
      'sessions',
      'shoring_plans',
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

  it("0001 adds the members table (its rows go with their job) and the job's adopted code", () => {
    database = openDatabase(':memory:');
    migrateDatabase(database.db);
    const { db } = database;
    const columns = (table: string) =>
      db.all<{ name: string }>(sql`select name from pragma_table_info(${table})`).map((c) => c.name);
    expect(columns('jobs')).toContain('adopted_code');
    expect(columns('members')).toEqual([
      'id',
      'job_id',
      'org_id',
      'kind',
      'label',
      'wall',
      'input',
      'material_id',
      'size_id',
      'summary',
      'result',
      'prescriptive',
      'engine_version',
      'created_by',
      'updated_by',
      'created_at',
      'updated_at',
      'version',
    ]);
    expect(db.all(sql`select name from pragma_index_list('members')`)).toContainEqual({
      name: 'members_job_created',
    });
    db.run(
      sql`insert into organizations (id, name, kind, created_at) values ('o', 'Firm', 'contracting', 'now')`,
    );
    db.run(
      sql`insert into users (id, email, name, password_hash, created_at) values ('u', 'u@x.test', 'U', 'h', 'now')`,
    );
    db.run(
      sql`insert into jobs (id, org_id, name, address, stories, roof_type, roof_pitch_in12, load_standard,
        ground_snow_psf, ground_snow_source, foundation, notes, created_by, created_at, updated_at)
        values ('j', 'o', 'Job', '', 1, 'gable', 6, 'ASCE 7-22', 0, '', 'unknown', '', 'u', 'now', 'now')`,
    );
    const insertMember = (jobId: string) =>
      db.run(
        sql`insert into members (id, job_id, org_id, kind, label, wall, input, material_id, size_id, summary,
          result, engine_version, created_by, updated_by, created_at, updated_at)
          values ('m', ${jobId}, 'o', 'header', 'H', '', '{}', 'x', 'y', '{}', '{}', 'v', 'u', 'u', 'now', 'now')`,
      );
    expect(() => insertMember('no-job')).toThrow(
      expect.objectContaining({ cause: expect.objectContaining({ code: 'SQLITE_CONSTRAINT_FOREIGNKEY' }) }),
    );
    insertMember('j');
    expect(db.get<{ n: number }>(sql`select count(*) as n from members`)).toEqual({ n: 1 });
    db.run(sql`delete from jobs where id = 'j'`);
    expect(db.get<{ n: number }>(sql`select count(*) as n from members`)).toEqual({ n: 0 });
  });

  it('0008 keeps idempotency keys once per person and gives every synced row a version starting at 1', () => {
    database = openDatabase(':memory:');
    migrateDatabase(database.db);
    const { db } = database;
    const columns = (table: string) =>
      db.all<{ name: string }>(sql`select name from pragma_table_info(${table})`).map((c) => c.name);
    expect(columns('idempotency_keys')).toEqual([
      'user_id',
      'key',
      'method',
      'path',
      'body_hash',
      'status',
      'response',
      'created_at',
    ]);
    for (const table of ['jobs', 'members', 'shoring_plans', 'job_checklist_items', 'bearing_screens']) {
      expect(columns(table), table).toContain('version');
    }
    expect(columns('shoring_plans')).toContain('id');
    db.run(
      sql`insert into users (id, email, name, password_hash, created_at) values ('u', 'u@x.test', 'U', 'h', 'now')`,
    );
    db.run(
      sql`insert into organizations (id, name, kind, created_at) values ('o', 'Firm', 'contracting', 'now')`,
    );
    db.run(
      sql`insert into jobs (id, org_id, name, address, stories, roof_type, roof_pitch_in12, load_standard,
        ground_snow_psf, ground_snow_source, foundation, notes, created_by, created_at, updated_at)
        values ('j', 'o', 'Job', '', 1, 'gable', 6, 'ASCE 7-22', 0, '', 'unknown', '', 'u', 'now', 'now')`,
    );
    expect(db.get(sql`select version from jobs where id = 'j'`)).toEqual({ version: 1 });
    const keep = (key: string) =>
      db.run(
        sql`insert into idempotency_keys (user_id, key, method, path, body_hash, created_at)
          values ('u', ${key}, 'POST', '/api/jobs', 'h', 'now')`,
      );
    keep('key-00000001');
    expect(() => keep('key-00000001')).toThrow(
      expect.objectContaining({ cause: expect.objectContaining({ code: 'SQLITE_CONSTRAINT_UNIQUE' }) }),
    );
    db.run(sql`delete from jobs where id = 'j'`);
    db.run(sql`delete from users where id = 'u'`);
    expect(db.get<{ n: number }>(sql`select count(*) as n from idempotency_keys`)).toEqual({ n: 0 });
  });
});
