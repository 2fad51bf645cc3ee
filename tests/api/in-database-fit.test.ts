import { sql } from 'drizzle-orm';
import { EstimationError } from '@shared/estimation/estimation-error';
import { fitLinearModel } from '@shared/estimation/least-squares/fit-linear-model';
import type { LinearFit } from '@shared/estimation/least-squares/linear-fit';
import { connectDatabase } from '../../server/db/database';
import { fitInDatabase } from '../../server/estimation/in-database-least-squares';
import type {
  FitDatabase,
  InDatabaseModelSpec,
} from '../../server/estimation/in-database-model-spec';
import { createDemandRowsTable, readColumns } from '../support/demand-rows-table';
import { loadStrdSet, logRelativeError } from '../fixtures/strd/load-strd-set';

// One connection, so the temporary tables are visible to every query of the fits.
const db = connectDatabase(process.env['DATABASE_URL']!, 1);
const TABLE = 'demand_rows';
const ROWS = 3000;
const AGREEMENT = 1e-9;

beforeAll(async () => {
  await createDemandRowsTable(db, TABLE, ROWS);
  await db.execute(sql`CREATE TEMP TABLE norris (x float8, y float8)`);
  const norris = loadStrdSet('Norris');
  const values = norris.x!.map((x, i) => sql`(${x}, ${norris.y[i]})`);
  await db.execute(sql`INSERT INTO norris (x, y) VALUES ${sql.join(values, sql`, `)}`);
});

afterAll(async () => {
  await db.$client.end();
});

const source = { table: TABLE };
const demandModel: InDatabaseModelSpec = {
  source,
  response: { log: 'qty' },
  regressors: [{ log: 'price' }, { log: 'income' }, 'shelf'],
};

/** The same rows, pulled into Node for the in-memory second implementation (logs by ln()). */
async function inMemoryColumns(where = sql`true`) {
  return readColumns(
    db,
    sql`SELECT ln(qty) AS "ln(qty)", ln(price) AS "ln(price)", ln(income) AS "ln(income)",
      shelf::float8 AS shelf, region, weight FROM ${sql.identifier(TABLE)} WHERE ${where} ORDER BY id`,
  );
}

function inMemoryFit(
  columns: Record<string, number[]>,
  options: Partial<Parameters<typeof fitLinearModel>[0]> = {},
): LinearFit {
  const column = (name: string) => ({ name, values: columns[name] });
  return fitLinearModel({
    response: column('ln(qty)'),
    regressors: ['ln(price)', 'ln(income)', 'shelf'].map(column),
    ...options,
  });
}

const relative = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

/** Second implementation: fitLinearModel (Householder QR, refined) on the same rows. */
function expectAgreement(inDatabase: LinearFit, inMemory: LinearFit): void {
  expect(inDatabase.coefficients.map((c) => c.term)).toEqual(
    inMemory.coefficients.map((c) => c.term),
  );
  inMemory.coefficients.forEach((expected, j) => {
    const actual = inDatabase.coefficients[j];
    expect(relative(actual.estimate, expected.estimate)).toBeLessThan(AGREEMENT);
    expect(relative(actual.stdError, expected.stdError)).toBeLessThan(AGREEMENT);
    expect(relative(actual.ciHigh, expected.ciHigh)).toBeLessThan(AGREEMENT);
  });
  expect(inDatabase.n).toBe(inMemory.n);
  expect(inDatabase.standardErrors).toEqual(inMemory.standardErrors);
  expect(relative(inDatabase.rSquared, inMemory.rSquared)).toBeLessThan(AGREEMENT);
  expect(relative(inDatabase.residualSD, inMemory.residualSD)).toBeLessThan(AGREEMENT);
  expect(relative(inDatabase.fStatistic!, inMemory.fStatistic!)).toBeLessThan(AGREEMENT);
}

async function refusalOf(fit: Promise<unknown>) {
  try {
    await fit;
  } catch (error) {
    if (error instanceof EstimationError)
      return { code: error.code, field: error.field, message: error.message };
    throw error;
  }
  throw new Error('expected an EstimationError, but the fit succeeded');
}

describe('fitInDatabase agrees with fitLinearModel on the same rows (to 1e-9 relative)', () => {
  it('with classical standard errors', async () => {
    const fit = await fitInDatabase(db, demandModel);
    expectAgreement(fit, inMemoryFit(await inMemoryColumns()));
    expect(fit.n).toBe(ROWS);
  });

  it('with HC1 standard errors', async () => {
    const fit = await fitInDatabase(db, { ...demandModel, standardErrors: { type: 'hc1' } });
    const expected = inMemoryFit(await inMemoryColumns(), { standardErrors: { type: 'hc1' } });
    expectAgreement(fit, expected);
    expect(fit.fTest).toBe('wald');
  });

  it('with cluster-robust standard errors', async () => {
    const columns = await inMemoryColumns();
    const fit = await fitInDatabase(db, {
      ...demandModel,
      standardErrors: { type: 'cluster', column: 'region' },
    });
    const expected = inMemoryFit(columns, {
      standardErrors: { type: 'cluster', clusters: { name: 'region', values: columns['region'] } },
    });
    expectAgreement(fit, expected);
    expect(fit.standardErrors.clusters).toBe(40);
  });

  it('with weights, for classical, HC1 and cluster-robust errors', async () => {
    const columns = await inMemoryColumns();
    const weights = { name: 'weight', values: columns['weight'] };
    const clusters = { name: 'region', values: columns['region'] };
    const cases = [
      [{ type: 'classical' }, { type: 'classical' }],
      [{ type: 'hc1' }, { type: 'hc1' }],
      [
        { type: 'cluster', column: 'region' },
        { type: 'cluster', clusters },
      ],
    ] as const;
    for (const [inDatabaseErrors, inMemoryErrors] of cases) {
      const fit = await fitInDatabase(db, {
        ...demandModel,
        weights: 'weight',
        standardErrors: inDatabaseErrors,
      });
      const expected = inMemoryFit(columns, { weights, standardErrors: inMemoryErrors });
      expectAgreement(fit, expected);
      expect(fit.weighted).toBe(true);
      expect(relative(fit.residualSumOfSquares, expected.residualSumOfSquares)).toBeLessThan(
        AGREEMENT,
      );
    }
  });

  it('without an intercept', async () => {
    const fit = await fitInDatabase(db, {
      ...demandModel,
      intercept: false,
      standardErrors: { type: 'hc1' },
    });
    const expected = inMemoryFit(await inMemoryColumns(), {
      intercept: false,
      standardErrors: { type: 'hc1' },
    });
    expectAgreement(fit, expected);
    expect(fit.rSquaredKind).toBe('uncentred');
  });

  it('on a subquery built with the sql template', async () => {
    const fit = await fitInDatabase(db, {
      ...demandModel,
      source: { query: sql`SELECT * FROM ${sql.identifier(TABLE)} WHERE shelf <= ${3}` },
    });
    expectAgreement(fit, inMemoryFit(await inMemoryColumns(sql`shelf <= 3`)));
  });

  it('hands back only sums: no query returns more than one row', async () => {
    const rowsSeen: number[] = [];
    const spy: FitDatabase = {
      transaction: (run) =>
        db.transaction((tx) =>
          run({
            execute: async (query) => {
              const result = await tx.execute(query);
              rowsSeen.push(result.rows.length);
              return result;
            },
          }),
        ),
    };
    await fitInDatabase(spy, {
      ...demandModel,
      standardErrors: { type: 'cluster', column: 'region' },
    });
    expect(rowsSeen.length).toBeGreaterThanOrEqual(4); // describe, shifts, sums, meat
    expect(Math.max(...rowsSeen)).toBe(1);
  });

  it('reads one snapshot: rows synced between its passes do not reach the second pass', async () => {
    // A table every connection sees, and a second connection that writes while the fit runs.
    const shared = 'demand_rows_during_fit';
    await db.execute(
      sql`CREATE TABLE ${sql.identifier(shared)} AS SELECT * FROM ${sql.identifier(TABLE)}`,
    );
    const writer = connectDatabase(process.env['DATABASE_URL']!, 1);
    try {
      let written = false;
      const interleaved: FitDatabase = {
        transaction: (run, config) =>
          db.transaction(
            (tx) =>
              run({
                execute: async (query) => {
                  const result = await tx.execute(query);
                  // Right after the first pass (its row carries the NULL count), a sync lands.
                  if (!written && result.rows[0] && 'incomplete' in result.rows[0]) {
                    written = true;
                    await writer.execute(sql`INSERT INTO ${sql.identifier(shared)}
                      SELECT id + ${ROWS}, qty * 3, price, income, shelf, region, weight
                      FROM ${sql.identifier(shared)} WHERE id <= 200`);
                  }
                  return result;
                },
              }),
            config,
          ),
      };
      const fit = await fitInDatabase(interleaved, {
        ...demandModel,
        source: { table: shared },
        standardErrors: { type: 'hc1' },
      });
      expect(written).toBe(true);
      const expected = inMemoryFit(await inMemoryColumns(), { standardErrors: { type: 'hc1' } });
      expectAgreement(fit, expected);
    } finally {
      await writer.$client.end();
      await db.execute(sql`DROP TABLE ${sql.identifier(shared)}`);
    }
  });
});

describe('fitInDatabase on NIST StRD Norris stored in a table', () => {
  const norris = loadStrdSet('Norris');
  const spec: InDatabaseModelSpec = {
    source: { table: 'norris' },
    response: 'y',
    regressors: ['x'],
  };

  it('matches the certified values to at least 12 digits', async () => {
    const fit = await fitInDatabase(db, spec);
    const certified = norris.certified; // NIST StRD Norris, certified values (published)
    certified.coefficients.forEach((value, j) => {
      expect(logRelativeError(fit.coefficients[j].estimate, value)).toBeGreaterThanOrEqual(12);
      expect(
        logRelativeError(fit.coefficients[j].stdError, certified.standardErrors[j]),
      ).toBeGreaterThanOrEqual(12);
    });
    expect(logRelativeError(fit.residualSD, certified.residualSD)).toBeGreaterThanOrEqual(12);
    expect(logRelativeError(fit.rSquared, certified.rSquared)).toBeGreaterThanOrEqual(12);
  });

  it('matches PostgreSQL 15 regr_slope and regr_intercept on the same table', async () => {
    // PostgreSQL 15 regr_slope, second implementation (Youngs–Cramer float8 sums).
    const { rows } = await db.execute(
      sql`SELECT regr_slope(y, x) AS slope, regr_intercept(y, x) AS intercept FROM norris`,
    );
    const fit = await fitInDatabase(db, spec);
    expect(relative(fit.coefficients[1].estimate, Number(rows[0]['slope']))).toBeLessThan(1e-11);
    expect(relative(fit.coefficients[0].estimate, Number(rows[0]['intercept']))).toBeLessThan(
      1e-10,
    );
  });
});

describe('fitInDatabase refuses bad input with an error naming the column', () => {
  const withSource = (query: ReturnType<typeof sql>): InDatabaseModelSpec => ({
    ...demandModel,
    source: { query },
  });
  const table = sql.identifier(TABLE);

  it('an unknown column', async () => {
    const refusal = await refusalOf(
      fitInDatabase(db, { ...demandModel, regressors: ['shelf', 'aisle'] }),
    );
    expect(refusal).toMatchObject({ code: 'missing-column', field: 'aisle' });
    expect(refusal.message).toContain('price');
  });

  it('an unknown table', async () => {
    const refusal = await refusalOf(
      fitInDatabase(db, { ...demandModel, source: { table: 'no_such_rows' } }),
    );
    expect(refusal).toMatchObject({ code: 'missing-table', field: 'source' });
  });

  it('a source without rows', async () => {
    const refusal = await refusalOf(
      fitInDatabase(db, withSource(sql`SELECT * FROM ${table} WHERE false`)),
    );
    expect(refusal.code).toBe('too-few-observations');
  });

  it('a log of a non-positive value', async () => {
    const zeroes = sql`SELECT id, qty, income, shelf,
      CASE WHEN id % 100 = 0 THEN 0 ELSE price END AS price FROM ${table}`;
    const refusal = await refusalOf(fitInDatabase(db, withSource(zeroes)));
    expect(refusal).toMatchObject({ code: 'non-positive-log', field: 'price' });
    expect(refusal.message).toContain('30 values ≤ 0');
  });

  it('a missing value', async () => {
    const gaps = sql`SELECT id, qty, price, CASE WHEN id = 5 THEN NULL ELSE shelf END AS shelf,
      income FROM ${table}`;
    const refusal = await refusalOf(fitInDatabase(db, withSource(gaps)));
    expect(refusal).toMatchObject({ code: 'invalid-value', field: 'shelf' });
  });

  it('a weight that is not positive', async () => {
    const weights = sql`SELECT *, CASE WHEN id = 9 THEN 0 ELSE weight END AS w FROM ${table}`;
    const refusal = await refusalOf(fitInDatabase(db, { ...withSource(weights), weights: 'w' }));
    expect(refusal).toMatchObject({ code: 'invalid-value', field: 'w' });
  });

  it('a missing cluster label', async () => {
    const labels = sql`SELECT *, CASE WHEN id = 3 THEN NULL ELSE region END AS cluster FROM ${table}`;
    const refusal = await refusalOf(
      fitInDatabase(db, {
        ...withSource(labels),
        standardErrors: { type: 'cluster', column: 'cluster' },
      }),
    );
    expect(refusal).toMatchObject({ code: 'invalid-value', field: 'cluster' });
  });

  it('a text column as a regressor', async () => {
    const text = sql`SELECT *, 'north'::text AS zone FROM ${table}`;
    const refusal = await refusalOf(
      fitInDatabase(db, { ...withSource(text), regressors: ['zone'] }),
    );
    expect(refusal).toMatchObject({ code: 'invalid-value', field: 'zone' });
  });
});
