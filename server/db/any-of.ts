import { sql, type Column, type Placeholder, type SQL } from 'drizzle-orm';

/**
 * `column = any($n::type[])`: the whole list is ONE array parameter, filled in when the prepared
 * query runs. drizzle's `inArray` binds one parameter per value, so a 200-id batch made
 * PostgreSQL parse and plan a fresh 200-parameter statement on every call; this statement's
 * text is the same for any list. The column's btree index serves both forms.
 */
export function anyOf(column: Column, list: Placeholder, type: 'uuid' | 'text'): SQL {
  return sql`${column} = any(${list}::${sql.raw(type)}[])`;
}
