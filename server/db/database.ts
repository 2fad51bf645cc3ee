import { drizzle, type NodePgDatabase } from 'drizzle-orm/node-postgres';
import pg from 'pg';
import * as schema from './schema';

export type Database = NodePgDatabase<typeof schema> & { $client: pg.Pool };

// count(*) and bigint sums arrive as strings by default; Fieldcurve's counts fit in a double.
pg.types.setTypeParser(pg.types.builtins.INT8, (value) => Number(value));

/** One pool per process; Drizzle maps camelCase keys onto snake_case columns. */
export function connectDatabase(url: string, max = 10): Database {
  const pool = new pg.Pool({ connectionString: url, max });
  return drizzle({ client: pool, schema, casing: 'snake_case' });
}

/** The database or an open transaction: repository functions accept either. */
export type Executor = Pick<Database, 'select' | 'insert' | 'update' | 'delete' | 'execute'>;
