import { connectDatabase } from '../../server/db/database';
import { applyMigrations } from '../../server/db/migrate';
import { seedDemo } from '../../server/demo/seed-demo';

/** Applies migrations and loads the demo scenario, then lets the connection go. */
export async function prepareDatabase(url: string): Promise<void> {
  const db = connectDatabase(url, 2);
  try {
    await applyMigrations(db);
    await seedDemo(db);
  } finally {
    await db.$client.end();
  }
}
