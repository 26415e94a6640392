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
