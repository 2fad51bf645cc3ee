import { randomBytes } from 'node:crypto';
import { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import { sql } from 'drizzle-orm';
import { from as copyFrom } from 'pg-copy-streams';
import type { DatasetFitSpec } from '@shared/datasets/dataset-fit-spec';
import { connectDatabase, type Database } from '../../server/db/database';
import { applyMigrations } from '../../server/db/migrate';
import { freePort } from '../stack/free-port';
import { startServerProcess } from '../stack/server-process';
import { startWorkerProcess } from '../stack/worker-process';
import type { BenchContext, BenchPart } from './bench-part';
import {
  benchCovariates,
  benchMapping,
  benchSalesCsv,
  createBenchResearcher,
  seedBenchDataset,
  type BenchResearcher,
} from './dataset-bench-setup';
import { serverEnv } from './sync-bench';

/** Rows of the imported CSV (DATASET_BENCH_IMPORT_ROWS) and of the fitted dataset (DATASET_BENCH_FIT_ROWS; 10000000 for the target size). */
const importRows = Number(process.env['DATASET_BENCH_IMPORT_ROWS'] ?? 500_000);
const fitRows = Number(process.env['DATASET_BENCH_FIT_ROWS'] ?? 1_000_000);
const chunkBytes = 8 * 1024 ** 2;

/**
 * The datasets part: `import-copy-ratio` — rows per second through the product's path (chunked
 * upload, import request, worker streaming csv-parse into COPY, until the API says imported)
 * over a raw COPY of the same CSV into a similar table; and `product-fit-floor-ratio` — the
 * product's fit job (API request to stored result: log-log, six regressors, HC1) over one
 * regr_slope scan of the same table computing the same logs.
 */
export const datasetBench: BenchPart = {
  name: 'datasets',
  async run(context) {
    const db = connectDatabase(context.databaseUrl, 2);
    const secret = randomBytes(32).toString('hex');
    const port = await freePort();
    const stops: (() => Promise<void>)[] = [];
    try {
      await applyMigrations(db);
      const researcher = await createBenchResearcher(db, secret);
      const env = serverEnv(context.databaseUrl, port, secret);
      const server = await startServerProcess({ ...env, WEB_PROCESSES: '1' }, true);
      stops.push(() => server.stop());
      const worker = await startWorkerProcess(env, true);
      stops.push(() => worker.stop());
      const api = apiClient(`http://127.0.0.1:${port}`, researcher);
      await importRatio(db, context, api);
      await fitRatio(db, context, api, researcher);
    } finally {
      for (const stop of stops.reverse()) await stop();
      await db.$client.end();
    }
  },
};

type Api = ReturnType<typeof apiClient>;

function apiClient(url: string, who: BenchResearcher) {
  const headers = { cookie: who.cookie, 'x-csrf-token': who.csrfToken };
  const call = async (method: string, path: string, body?: unknown, raw?: Buffer) => {
    const response = await fetch(`${url}/api/studies/${who.studyId}${path}`, {
      method,
      headers: {
        ...headers,
        'content-type': raw ? 'application/octet-stream' : 'application/json',
      },
      body: raw ? new Uint8Array(raw) : body === undefined ? undefined : JSON.stringify(body),
    });
    const text = await response.text();
    if (response.status >= 400) throw new Error(`${method} ${path}: ${response.status} ${text}`);
    return text ? (JSON.parse(text) as Record<string, unknown>) : {};
  };
  return call;
}

async function until(check: () => Promise<boolean>, what: string) {
  for (let i = 0; i < 60_000; i++) {
    if (await check()) return;
    await new Promise((r) => setTimeout(r, 25));
  }
  throw new Error(`${what} did not finish`);
}

async function importRatio(db: Database, context: BenchContext, api: Api) {
  const csv = benchSalesCsv(importRows);
  context.log(`import: ${importRows} rows, ${(csv.length / 1024 ** 2).toFixed(1)} MB of CSV`);
  const started = performance.now();
  const upload = await api('POST', '/dataset-uploads', {
    fileName: 'bench.csv',
    totalBytes: csv.length,
  });
  for (let offset = 0; offset < csv.length; offset += chunkBytes) {
    await api(
      'PUT',
      `/dataset-uploads/${String(upload['uploadId'])}?offset=${offset}`,
      undefined,
      csv.subarray(offset, offset + chunkBytes),
    );
  }
  const accepted = await api('POST', '/datasets', {
    uploadId: upload['uploadId'],
    name: 'Bench import',
    columns: benchMapping,
  });
  const datasetId = String(accepted['datasetId']);
  await until(async () => {
    const dataset = await api('GET', `/datasets/${datasetId}`);
    if (dataset['status'] === 'failed') throw new Error(JSON.stringify(dataset['problems']));
    return dataset['status'] === 'imported';
  }, 'the import');
  const productSeconds = (performance.now() - started) / 1000;

  const table = sql.identifier('bench_raw_copy');
  await db.execute(sql`DROP TABLE IF EXISTS ${table}`);
  await db.execute(sql`CREATE TABLE ${table} (outlet text, price float8, units float8,
    ${sql.join(
      benchCovariates.map((c) => sql`${sql.identifier(c)} float8`),
      sql`, `,
    )})`);
  const client = await db.$client.connect();
  const copyStarted = performance.now();
  try {
    await pipeline(
      Readable.from([csv]),
      client.query(copyFrom('COPY bench_raw_copy FROM STDIN (FORMAT csv, HEADER true)')),
    );
  } finally {
    client.release();
  }
  const copySeconds = (performance.now() - copyStarted) / 1000;
  await db.execute(sql`DROP TABLE ${table}`);
  const productRate = importRows / productSeconds;
  const copyRate = importRows / copySeconds;
  context.log(
    `import through the product: ${productSeconds.toFixed(2)} s; raw COPY: ${copySeconds.toFixed(2)} s`,
  );
  context.report('import-rows-per-s', productRate, 'rows/s');
  context.report('import-raw-copy-rows-per-s', copyRate, 'rows/s');
  context.report('import-copy-ratio', productRate / copyRate, 'x');
  await api('DELETE', `/datasets/${datasetId}`);
}

async function fitRatio(db: Database, context: BenchContext, api: Api, who: BenchResearcher) {
  context.log(`fit: seeding a dataset of ${fitRows} rows`);
  const { datasetId, table } = await seedBenchDataset(db, who.studyId, who.userId, fitRows);
  const spec: DatasetFitSpec = {
    form: 'loglog',
    covariates: benchCovariates.map((column) => ({ column, role: 'other' })),
    fixedEffects: [],
    weighted: false,
    standardErrors: { type: 'hc1' },
    instruments: [],
    confidenceLevel: 0.95,
  };
  const floorQuery = sql`SELECT regr_slope(ln(units), ln(price)),
    ${sql.join(
      benchCovariates.map((c) => sql`sum(ln(${sql.identifier(c)}))`),
      sql`, `,
    )} FROM ${table}`;
  const fitOnce = async () => {
    const started = performance.now();
    const asked = await api('POST', `/datasets/${datasetId}/fits`, { spec });
    await until(async () => {
      const fit = await api('GET', `/dataset-fits/${String(asked['fitId'])}`);
      if (fit['status'] === 'failed') throw new Error(JSON.stringify(fit['error']));
      return fit['status'] === 'done';
    }, 'the fit');
    return (performance.now() - started) / 1000;
  };
  const floorOnce = async () => {
    const started = performance.now();
    await db.execute(floorQuery);
    return (performance.now() - started) / 1000;
  };
  await floorOnce(); // warm the cache for both
  const fitTimes: number[] = [];
  const floorTimes: number[] = [];
  for (let round = 0; round < 3; round++) {
    floorTimes.push(await floorOnce());
    fitTimes.push(await fitOnce());
  }
  const median = (values: number[]) => [...values].sort((a, b) => a - b)[values.length >> 1];
  context.log(
    `fit on ${fitRows} rows: product ${median(fitTimes).toFixed(2)} s, floor ${median(floorTimes).toFixed(2)} s`,
  );
  context.report('product-fit-rows', fitRows, 'rows');
  context.report('product-fit-s', median(fitTimes), 's');
  context.report('product-fit-floor-s', median(floorTimes), 's');
  context.report('product-fit-floor-ratio', median(fitTimes) / median(floorTimes), 'x');
  await api('DELETE', `/datasets/${datasetId}`);
}
