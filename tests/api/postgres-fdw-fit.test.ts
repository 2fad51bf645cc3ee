import { chmodSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { sql, type SQL } from 'drizzle-orm';
import { PgDialect } from 'drizzle-orm/pg-core';
import { connectDatabase, type Database } from '../../server/db/database';
import { fitInDatabase } from '../../server/estimation/in-database-least-squares';
import type {
  FitDatabase,
  InDatabaseModelSpec,
} from '../../server/estimation/in-database-model-spec';
import { freePort } from '../../tools/stack/free-port';
import { startPostgres, type RunningCluster } from '../../tools/stack/postgres-cluster';
import { createDemandRowsTable } from '../support/demand-rows-table';

/**
 * An observation table partitioned by study whose second study's partition lives on another
 * PostgreSQL server, reached through postgres_fdw: the path by which a team outgrows one server.
 */
const ROWS = 2000;
const SCHEMA = 'spread_observations';
// Each partition's sums are rounded on their own before they are added (exactly), so the fit
// agrees with the one-table fit to float8 rounding of the sums, not bit for bit.
const AGREEMENT = 1e-10;

let remote: RunningCluster;
let remoteDir: string;
let remoteDb: Database;
let admin: Database;
// One connection, so the temporary table of the seeded rows is visible to every query.
const db = connectDatabase(process.env['DATABASE_URL']!, 1);

/** The same server as `url`, signed in as its superuser (the clusters' start command sets it). */
function superuserUrl(url: string): string {
  const parsed = new URL(url);
  parsed.username = 'postgres';
  return parsed.toString();
}

beforeAll(async () => {
  remoteDir = mkdtempSync(join(tmpdir(), 'fieldcurve-remote-'));
  chmodSync(remoteDir, 0o755); // the postgres user must reach its data folder inside
  remote = await startPostgres({
    dir: remoteDir,
    port: await freePort(),
    database: 'fieldcurve_remote',
    fresh: true,
  });
  remoteDb = connectDatabase(remote.url, 1);
  admin = connectDatabase(superuserUrl(process.env['DATABASE_URL']!), 1);
  const remoteUrl = new URL(remote.url);

  // Seeded rows of study 2 (invented constant-elasticity demand), copied to the remote server.
  await createDemandRowsTable(db, 'seeded_rows', ROWS, 11);
  const seeded = await db.execute(sql`SELECT * FROM seeded_rows ORDER BY id`);
  const columns = sql`(study_id integer, id integer, qty float8, price float8, income float8,
    shelf integer, region integer, weight float8)`;
  await remoteDb.execute(sql`CREATE TABLE study_2_observations ${columns}`);
  const values = seeded.rows.map(
    (r) =>
      sql`(2, ${r['id']}, ${r['qty']}, ${r['price']}, ${r['income']}, ${r['shelf']}, ${r['region']}, ${r['weight']})`,
  );
  for (let start = 0; start < values.length; start += 500) {
    await remoteDb.execute(
      sql`INSERT INTO study_2_observations VALUES ${sql.join(values.slice(start, start + 500), sql`, `)}`,
    );
  }

  await admin.execute(sql`CREATE EXTENSION IF NOT EXISTS postgres_fdw`);
  await admin.execute(sql`DROP SCHEMA IF EXISTS ${sql.identifier(SCHEMA)} CASCADE`);
  await admin.execute(sql`DROP SERVER IF EXISTS second_server CASCADE`);
  await admin.execute(
    sql.raw(`CREATE SERVER second_server FOREIGN DATA WRAPPER postgres_fdw OPTIONS (host '127.0.0.1',
      port '${remoteUrl.port}', dbname 'fieldcurve_remote')`),
  );
  await admin.execute(
    sql.raw(`CREATE USER MAPPING FOR ${new URL(process.env['DATABASE_URL']!).username} SERVER second_server
      OPTIONS (user '${remoteUrl.username}', password '${decodeURIComponent(remoteUrl.password)}')`),
  );
  await admin.execute(sql`CREATE SCHEMA ${sql.identifier(SCHEMA)} AUTHORIZATION fieldcurve`);
  await admin.execute(sql.raw(`GRANT USAGE ON FOREIGN SERVER second_server TO fieldcurve`));
  // The table partitioned by study: study 1 here, study 2 on the second server.
  await db.execute(
    sql`CREATE TABLE ${sql.identifier(SCHEMA)}.observations ${columns} PARTITION BY LIST (study_id)`,
  );
  await db.execute(
    sql`CREATE TABLE ${sql.identifier(SCHEMA)}.study_1 PARTITION OF ${sql.identifier(SCHEMA)}.observations FOR VALUES IN (1)`,
  );
  await db.execute(
    sql`CREATE FOREIGN TABLE ${sql.identifier(SCHEMA)}.study_2 PARTITION OF ${sql.identifier(SCHEMA)}.observations
      FOR VALUES IN (2) SERVER second_server OPTIONS (schema_name 'public', table_name 'study_2_observations')`,
  );
  // Study 1's rows are other numbers, so a fit that read the wrong partition would not agree.
  await db.execute(sql`INSERT INTO ${sql.identifier(SCHEMA)}.observations
    SELECT 1, id, qty * 2, price, income, shelf, region, weight FROM seeded_rows`);
  // The single-server reference: both studies' rows in one local table.
  await db.execute(
    sql`CREATE TEMP TABLE single_server AS SELECT 2 AS study_id, * FROM seeded_rows
      UNION ALL SELECT 1, id, qty * 2, price, income, shelf, region, weight FROM seeded_rows`,
  );
}, 120_000);

afterAll(async () => {
  await admin?.execute(sql`DROP SCHEMA IF EXISTS ${sql.identifier(SCHEMA)} CASCADE`);
  await admin?.execute(sql`DROP SERVER IF EXISTS second_server CASCADE`);
  await Promise.all([db.$client.end(), admin?.$client.end(), remoteDb?.$client.end()]);
  remote?.stop();
  if (remoteDir) rmSync(remoteDir, { recursive: true, force: true });
});

const model = (source: InDatabaseModelSpec['source']): InDatabaseModelSpec => ({
  source,
  response: { log: 'qty' },
  regressors: [{ log: 'price' }, { log: 'income' }, 'shelf'],
  weights: 'weight',
  aggregateAtSource: true,
});

const spread = { schema: SCHEMA, table: 'observations' };

/** The database, with every statement the fit sends recorded. */
function recording(into: SQL[]): FitDatabase {
  return {
    transaction: (run, config) =>
      db.transaction(
        (tx) =>
          run({
            execute: (query: SQL) => {
              into.push(query);
              return tx.execute(query);
            },
          }),
        config,
      ),
  };
}

const dialect = new PgDialect();
const sqlText = (query: SQL) => dialect.sqlToQuery(query).sql;

const relative = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe('the in-database fit over a partition on a second server', () => {
  it('equals the single-server fit', async () => {
    const twoServers = await fitInDatabase(db, model(spread));
    // Second computation: the same engine over the same rows in one local table, in one pass.
    const single = await fitInDatabase(db, {
      ...model({ table: 'single_server' }),
      aggregateAtSource: false,
    });
    expect(twoServers.n).toBe(2 * ROWS);
    expect(single.n).toBe(2 * ROWS);
    single.coefficients.forEach((expected, j) => {
      const actual = twoServers.coefficients[j];
      expect(actual.term).toBe(expected.term);
      expect(relative(actual.estimate, expected.estimate)).toBeLessThan(AGREEMENT);
      expect(relative(actual.stdError, expected.stdError)).toBeLessThan(AGREEMENT);
    });
    expect(relative(twoServers.rSquared, single.rSquared)).toBeLessThan(AGREEMENT);
  });

  it('has the second server compute the sums (EXPLAIN VERBOSE shows the aggregates pushed down)', async () => {
    const sent: SQL[] = [];
    await fitInDatabase(recording(sent), model(spread));
    const sums = sent.find(
      (q) => sqlText(q).includes('regr_sxy') && sqlText(q).includes('study_2 AS src'),
    );
    expect(sums).toBeDefined();
    const plan = (await db.execute(sql`EXPLAIN (VERBOSE) ${sums!}`)).rows
      .map((r) => String(r['QUERY PLAN']))
      .join('\n');
    // postgres_fdw names a pushed-down aggregate "Aggregate on (...)" and ships the sums in its
    // remote SQL; the local plan then has no aggregate node and no row-by-row scan.
    expect(plan).toMatch(/Foreign Scan/);
    expect(plan).toMatch(/Relations: Aggregate on \(spread_observations\.study_2 src\)/);
    expect(plan).toMatch(/Remote SQL: SELECT count\(\*\), .*regr_sxy\(/);
    expect(plan).toMatch(/FROM public\.study_2_observations$/m);
    expect(plan).not.toMatch(/^\s*(->\s*)?(Aggregate|HashAggregate|GroupAggregate)\b/m);
  });

  it('without the option, the fenced subquery makes the remote send its rows', async () => {
    const sent: SQL[] = [];
    const spec = { ...model(spread), aggregateAtSource: false };
    const fenced = await fitInDatabase(recording(sent), spec);
    const single = await fitInDatabase(db, model({ table: 'single_server' }));
    expect(relative(fenced.coefficients[1].estimate, single.coefficients[1].estimate)).toBeLessThan(
      AGREEMENT,
    );
    const sums = sent.find((q) => sqlText(q).includes('regr_sxy'))!;
    const plan = (await db.execute(sql`EXPLAIN (VERBOSE) ${sums}`)).rows
      .map((r) => String(r['QUERY PLAN']))
      .join('\n');
    expect(plan).toMatch(/^\s*Aggregate\b/m);
    expect(plan).not.toMatch(/Relations: Aggregate on/);
  });
});
