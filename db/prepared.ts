import type { DbOrTx } from './client';

/**
 * A statement built and prepared once per database handle (drizzle `.prepare()` with `sql.placeholder`s),
 * instead of building the query and preparing its SQL on every call. A transaction handle is new each
 * time, so inside one the statement is prepared afresh, as an unprepared query would be.
 */
export function preparedPerDb<T>(build: (db: DbOrTx) => T): (db: DbOrTx) => T {
  const cache = new WeakMap<DbOrTx, T>();
  return (db) => {
    let statement = cache.get(db);
    if (statement === undefined) {
      statement = build(db);
      cache.set(db, statement);
    }
    return statement;
  };
}
