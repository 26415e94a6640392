import type Database from 'better-sqlite3';
import { sql, type SQL } from 'drizzle-orm';
import type { DbOrTx } from './client';

/**
 * The connection a handle runs on: a transaction handle is new each time, but it runs its statements on the
 * session (and better-sqlite3 connection) of the database it was opened on, as do nested savepoints.
 */
const connectionOf = (db: DbOrTx): object => (db as unknown as { session?: object }).session ?? db;

/**
 * A statement built and prepared once per database connection (drizzle `.prepare()` with
 * `sql.placeholder`s), instead of building the query and preparing its SQL on every call. Inside a
 * transaction the same prepared statement runs: better-sqlite3 runs every statement of a connection inside
 * the transaction open on it.
 */
export function preparedPerDb<T>(build: (db: DbOrTx) => T): (db: DbOrTx) => T {
  const cache = new WeakMap<object, T>();
  return (db) => {
    const connection = connectionOf(db);
    let statement = cache.get(connection);
    if (statement === undefined) {
      statement = build(db);
      cache.set(connection, statement);
    }
    return statement;
  };
}

/** The better-sqlite3 connection under a database or transaction handle. */
const clientOf = (db: DbOrTx): Database.Database =>
  (db as unknown as { session: { client: Database.Database } }).session.client;

/** A drizzle query not yet run: its SQL, with `sql.placeholder`s as `?`. */
type BuiltQuery = { toSQL: () => { sql: string } };

/**
 * For the few reads every signed-in request makes: the SQL drizzle builds for `query` (with
 * `sql.placeholder`s as `?`), prepared once per connection on better-sqlite3 itself, answering rows as
 * arrays in the order the query selects. It skips drizzle's per-row mapping: `toRow` names the values and
 * must itself parse any JSON column (text and numbers come as stored).
 */
export function rawPreparedPerDb<Row>(build: (db: DbOrTx) => BuiltQuery, toRow: (values: unknown[]) => Row) {
  const statement = preparedPerDb((db) => clientOf(db).prepare(build(db).toSQL().sql).raw(true));
  return {
    all: (db: DbOrTx, ...params: unknown[]): Row[] =>
      (statement(db).all(...params) as unknown[][]).map(toRow),
    get: (db: DbOrTx, ...params: unknown[]): Row | undefined => {
      const values = statement(db).get(...params) as unknown[] | undefined;
      return values && toRow(values);
    },
  };
}

/** `toRow` for rawPreparedPerDb: names the values after a selection's keys, in the order it selects them. */
export function namedAfter<Row>(selection: Record<keyof Row, unknown>): (values: unknown[]) => Row {
  const keys = Object.keys(selection);
  return (values) => {
    const row: Record<string, unknown> = {};
    for (let i = 0; i < keys.length; i++) row[keys[i]] = values[i];
    return row as Row;
  };
}

/**
 * For the writes of a member save: the SQL drizzle builds for `query` (an insert or update with
 * `sql.placeholder`s), prepared once per connection on better-sqlite3 and run with the parameters by
 * position, in the order the SQL names them (the set or values keys, then the where clause). JSON columns
 * take their text: the caller stringifies them, as drizzle would.
 */
export function rawRunPerDb(build: (db: DbOrTx) => BuiltQuery) {
  const statement = preparedPerDb((db) => clientOf(db).prepare(build(db).toSQL().sql));
  return (db: DbOrTx, ...params: unknown[]): Database.RunResult => statement(db).run(...params);
}

/** A `?` for a value of a raw write's `set` or `values` (a placeholder typed as SQL, which every column takes). */
export const slot = (name: string): SQL => sql`${sql.placeholder(name)}`;

const changeStampStatement = preparedPerDb((db) =>
  clientOf(db).prepare('SELECT total_changes(), data_version FROM pragma_data_version').raw(true),
);

/**
 * Where the database stands: the rows this connection has changed so far (SQLite's total_changes) and the
 * commits other connections have made (PRAGMA data_version). Two equal stamps mean that nothing was
 * written in between, by this connection or another; a rolled-back write still moves the stamp.
 */
export function changeStamp(db: DbOrTx): string {
  const [own, others] = changeStampStatement(db).get() as [number, number];
  return `${own}:${others}`;
}
