import { migrate } from 'drizzle-orm/node-postgres/migrator';
import { resolve } from 'node:path';
import type { Database } from './database';

const migrationsFolder = resolve(import.meta.dirname, '..', '..', 'drizzle');

/** Applies every migration in drizzle/ that this database has not seen yet. */
export async function applyMigrations(db: Database): Promise<void> {
  await migrate(db, { migrationsFolder });
}
