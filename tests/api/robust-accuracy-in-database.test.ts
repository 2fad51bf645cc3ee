import { sql } from 'drizzle-orm';
import { tQuantile } from '@shared/estimation/distributions/student-t';
import type { LinearFit } from '@shared/estimation/least-squares/linear-fit';
import { connectDatabase } from '../../server/db/database';
import { fitInDatabase } from '../../server/estimation/in-database-least-squares';
import type {
  InDatabaseModelSpec,
  InDatabaseStandardErrors,
} from '../../server/estimation/in-database-model-spec';
import { multiplePrecisionFit } from '../fixtures/near-collinear/multiple-precision-fit';
import {
  nearCollinearDesign,
  type NearCollinearDesign,
} from '../fixtures/near-collinear/near-collinear-design';
import { logRelativeError } from '../fixtures/strd/load-strd-set';

// Expected values: exact least squares computed in the test in 50-digit decimal arithmetic
// (decimal.js) from the same rows the table holds, each float8 read as PostgreSQL prints it
// (its shortest round-trip decimal, which is what the exact numeric sums add up); see
// multiple-precision-fit.ts.
const REQUIRED_DIGITS = 9;
const ROWS = 240;
const REGIONS = ['r1', 'r2', 'r3'];

// One connection, so the temporary tables are visible to every query of the fits.
const db = connectDatabase(process.env['DATABASE_URL']!, 1);

/** Scaled condition numbers of the design from about 1e2 to 1e7 (see nearCollinearDesign). */
const CASES = [
  { table: 'collinear_a', seed: 41, gap: 0.05 },
  { table: 'collinear_b', seed: 31, gap: 2e-3 },
  { table: 'collinear_c', seed: 11, gap: 1.75e-6 },
  { table: 'collinear_d', seed: 21, gap: 3.5e-7 },
] as const;
const ESTIMATORS = ['least squares', 'weighted', 'fixed effects'] as const;
type Estimator = (typeof ESTIMATORS)[number];

const designs = new Map<string, NearCollinearDesign>();
const worst: Record<string, number> = {};

async function storeDesign(table: string, design: NearCollinearDesign): Promise<void> {
  await db.execute(sql`CREATE TEMP TABLE ${sql.identifier(table)} (ln_q float8, ln_p float8,
    ln_p2 float8, ln_income float8, r1 float8, r2 float8, r3 float8, weight float8, market text)`);
  const rows = design.lnQty.map((_, i) => {
    const dummies = REGIONS.map((r) => (design.regions[i] === r ? 1 : 0));
    return sql`(${design.lnQty[i]}, ${design.lnPrice[i]}, ${design.lnOtherPrice[i]},
      ${design.lnIncome[i]}, ${dummies[0]}, ${dummies[1]}, ${dummies[2]}, ${design.weights[i]},
      ${design.markets[i]})`;
  });
  await db.execute(sql`INSERT INTO ${sql.identifier(table)} VALUES ${sql.join(rows, sql`, `)}`);
}

beforeAll(async () => {
  for (const { table, seed, gap } of CASES) {
    const design = nearCollinearDesign(seed, ROWS, gap);
    designs.set(table, design);
    await storeDesign(table, design);
  }
});

afterAll(async () => {
  const rows = Object.entries(worst).map(([k, v]) => `${k.padEnd(44)} ${v.toFixed(1)}`);
  console.log(`in-database fits, worst matching digits (LRE, capped at 15):\n${rows.join('\n')}`);
  await db.$client.end();
});

function regressorsOf(estimator: Estimator): string[] {
  return ['ln_p', 'ln_p2', 'ln_income', ...(estimator === 'fixed effects' ? REGIONS : [])];
}

function record(key: string, digits: number): number {
  worst[key] = Math.min(worst[key] ?? Infinity, digits);
  return digits;
}

describe.each(CASES)('in-database fits of $table (price gap $gap)', ({ table }) => {
  it.each(ESTIMATORS)(
    '%s: coefficients, classical, HC1 and cluster errors to 9 digits',
    async (estimator) => {
      const design = designs.get(table)!;
      const regressors = regressorsOf(estimator);
      const weighted = estimator !== 'least squares';
      const reference = multiplePrecisionFit({
        columns: [
          design.lnQty.map(() => 1),
          design.lnPrice,
          design.lnOtherPrice,
          design.lnIncome,
          ...(estimator === 'fixed effects'
            ? REGIONS.map((r) => design.regions.map((label) => (label === r ? 1 : 0)))
            : []),
        ],
        y: design.lnQty,
        weights: weighted ? design.weights : null,
        clusters: design.markets,
        reading: 'shortest-decimal',
      });
      const digits: number[] = [];
      const errorTypes: [string, InDatabaseStandardErrors, number[]][] = [
        ['classical', { type: 'classical' }, reference.classical],
        ['hc1', { type: 'hc1' }, reference.hc1],
        ['cluster', { type: 'cluster', column: 'market' }, reference.cluster!],
      ];
      for (const [name, standardErrors, expected] of errorTypes) {
        const spec: InDatabaseModelSpec = {
          source: { table },
          response: 'ln_q',
          regressors,
          ...(weighted ? { weights: 'weight' } : {}),
          standardErrors,
        };
        const fit: LinearFit = await fitInDatabase(db, spec);
        const t = tQuantile(0.975, fit.standardErrors.df);
        fit.coefficients.forEach((row, j) => {
          const high = reference.estimates[j] + t * expected[j];
          const low = reference.estimates[j] - t * expected[j];
          digits.push(
            record(
              `${estimator}: coefficients`,
              logRelativeError(row.estimate, reference.estimates[j]),
            ),
            record(`${estimator}: ${name} errors`, logRelativeError(row.stdError, expected[j])),
            record(
              `${estimator}: ${name} interval ends`,
              Math.min(logRelativeError(row.ciHigh, high), logRelativeError(row.ciLow, low)),
            ),
          );
        });
      }
      // Every coefficient, standard error and interval end against the 50-digit reference.
      expect(Math.min(...digits)).toBeGreaterThanOrEqual(REQUIRED_DIGITS);
    },
  );
});
