import { sql } from 'drizzle-orm';
import { gaussian } from '@shared/estimation/random/gaussian';
import { mulberry32 } from '@shared/estimation/random/mulberry32';
import type { Database } from '../../server/db/database';

/** Columns of the seeded demand table (invented data). */
const COLUMNS = ['id', 'qty', 'price', 'income', 'shelf', 'region', 'weight'] as const;

/**
 * Fills a temporary table with seeded constant-elasticity demand rows: ln q = 2 − 1.4·ln p +
 * 0.6·ln income + 0.05·shelf + a region effect + noise whose spread grows with the shelf (so HC1
 * differs from classical) and that is shared within a region (so clustering matters). Income
 * has a large mean relative to its spread, the case where uncentred sums lose digits.
 */
export async function createDemandRowsTable(db: Database, table: string, rows: number, seed = 7) {
  const uniform = mulberry32(seed);
  const normal = gaussian(uniform);
  const regionEffect = Array.from({ length: 40 }, () => 0.15 * normal());
  const values = Array.from({ length: rows }, (_, i) => {
    const lnPrice = 1 + 0.3 * normal();
    const lnIncome = 8 + 0.4 * normal();
    const shelf = 1 + Math.floor(uniform() * 5);
    const region = i % 40;
    const noise = (0.1 + 0.05 * shelf) * normal() + regionEffect[region];
    const lnQty = 2 - 1.4 * lnPrice + 0.6 * lnIncome + 0.05 * shelf + noise;
    const weight = 0.5 + uniform();
    return [i + 1, Math.exp(lnQty), Math.exp(lnPrice), Math.exp(lnIncome), shelf, region, weight];
  });
  await db.execute(sql`CREATE TEMP TABLE ${sql.identifier(table)} (id integer PRIMARY KEY,
    qty float8, price float8, income float8, shelf integer, region integer, weight float8)`);
  for (let start = 0; start < rows; start += 1000) {
    const chunk = values.slice(start, start + 1000).map((row) => sql`(${sql.join(row, sql`, `)})`);
    await db.execute(
      sql`INSERT INTO ${sql.identifier(table)} (${sql.join(
        COLUMNS.map((c) => sql.identifier(c)),
        sql`, `,
      )}) VALUES ${sql.join(chunk, sql`, `)}`,
    );
  }
}

/** Named numeric columns read back in id order (a test may pull rows; the fit never does). */
export async function readColumns(
  db: Database,
  query: ReturnType<typeof sql>,
): Promise<Record<string, number[]>> {
  const result = await db.execute(query);
  const columns: Record<string, number[]> = {};
  for (const field of result.fields) columns[field.name] = [];
  for (const row of result.rows) {
    for (const field of result.fields) columns[field.name].push(Number(row[field.name]));
  }
  return columns;
}
