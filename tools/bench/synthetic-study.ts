import { sql } from 'drizzle-orm';
import type { Database } from '../../server/db/database';

/** Log covariates of the synthetic study, with their true coefficients in the demand curve. */
export const STUDY_COVARIATES = {
  ln_income: 0.4,
  ln_household: -0.2,
  ln_distance: 0.1,
  ln_shelf_space: 0.3,
  ln_rival_price: 0.5,
  ln_footfall: 0.15,
} as const;

/** The true own-price elasticity of the synthetic study. */
export const TRUE_ELASTICITY = -1.3;

/**
 * Creates and fills `table` in one INSERT … SELECT over generate_series: a constant-elasticity
 * demand ln q = 4 − 1.3·ln p + Σγⱼ·ln cⱼ + noise, with the price correlated with income and the
 * rival's price, raw price and quantity stored beside their logs (the logs once, at load). Seeded,
 * unlogged (a benchmark table needs no crash safety), vacuumed so every scan sees the same pages.
 */
export async function createSyntheticStudy(db: Database, table: string, rows: number) {
  const name = sql.identifier(table);
  const covariates = Object.keys(STUDY_COVARIATES).map((c) => sql.identifier(c));
  const demand = Object.entries(STUDY_COVARIATES).map(
    ([c, gamma]) => sql` + ${sql.raw(String(gamma))} * ${sql.identifier(c)}`,
  );
  await db.execute(sql`DROP TABLE IF EXISTS ${name}`);
  await db.execute(sql`CREATE UNLOGGED TABLE ${name} (price float8, qty float8,
    ln_price float8, ln_qty float8, ${sql.join(
      covariates.map((c) => sql`${c} float8`),
      sql`, `,
    )}, region integer)`);
  await db.transaction(async (tx) => {
    await tx.execute(sql`SELECT setseed(0.42)`);
    await tx.execute(sql`INSERT INTO ${name}
      SELECT exp(ln_price), exp(ln_qty), ln_price, ln_qty, ${sql.join(covariates, sql`, `)}, region
      FROM (SELECT *, 4 + ${sql.raw(String(TRUE_ELASTICITY))} * ln_price ${sql.join(demand)}
                      + 0.5 * (random() + random() - 1) AS ln_qty
            FROM (SELECT *, 0.9 + 0.6 * (random() - 0.5) + 0.1 * (ln_income - 8)
                            + 0.3 * (ln_rival_price - 0.9) AS ln_price
                  FROM (SELECT 8 + 0.8 * (random() - 0.5) AS ln_income,
                               1.2 + 0.5 * (random() - 0.5) AS ln_household,
                               3 + random() AS ln_distance,
                               0.5 * random() AS ln_shelf_space,
                               0.9 + 0.4 * (random() - 0.5) AS ln_rival_price,
                               5 + 2 * (random() - 0.5) AS ln_footfall,
                               (g % 500)::integer AS region
                        FROM generate_series(1, ${rows}) AS g) AS covariates) AS priced) AS sold`);
  });
  await db.execute(sql`VACUUM ANALYZE ${name}`);
}

export async function dropSyntheticStudy(db: Database, table: string) {
  await db.execute(sql`DROP TABLE IF EXISTS ${sql.identifier(table)}`);
}
