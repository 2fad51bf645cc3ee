import type { Executor } from './database';

/**
 * A drizzle prepared query built once per executor (the database, or one transaction: drizzle
 * binds a prepared query to either) and reused on every later call. Building a query's SQL in
 * drizzle takes longer than PostgreSQL takes to run a small lookup; a named query is also
 * parsed and planned once per connection rather than on every call.
 */
export function preparedPerExecutor<Query>(
  build: (db: Executor) => Query,
): (db: Executor) => Query {
  const built = new WeakMap<Executor, Query>();
  return (db) => {
    let query = built.get(db);
    if (query === undefined) {
      query = build(db);
      built.set(db, query);
    }
    return query;
  };
}
