import { randomBytes } from 'node:crypto';
import { connectDatabase } from '../../server/db/database';
import { applyMigrations } from '../../server/db/migrate';
import { freePort } from '../stack/free-port';
import type { BenchContext, BenchPart } from './bench-part';
import { startServerProcess } from '../stack/server-process';
import { benchBatches } from './sync-bench-interviews';
import { batchBody, runDevices } from './sync-bench-load';
import { createBenchStudy } from './sync-bench-setup';
import { exportInterviewRows, timeCopy } from './sync-bench-copy';
import { cpuSeconds } from './process-cpu';

/** How much load the sync part makes. */
export interface SyncBenchSize {
  /** Simulated devices syncing at once. */
  devices: number;
  /** Batches of 200 interviews each device sends per timed round (after the warm-up batches). */
  batchesPerDevice: number;
}

export interface SyncBenchFigures {
  interviewsPerSecond: number;
  copyRowsPerSecond: number;
  ratio: number;
}

const batchSize = 200;
const rounds = 3;
/**
 * Batches each device sends before the clock starts, so every web process has compiled its hot
 * paths: with one, the first timed round ran about a third slower than the next two.
 */
const warmUpBatches = 3;

/** The environment a real server process needs; only the database is real here. */
export function serverEnv(
  databaseUrl: string,
  port: number,
  secret: string,
): Record<string, string> {
  return {
    HOST: '127.0.0.1',
    PORT: String(port),
    APP_URL: `http://127.0.0.1:${port}`,
    DATABASE_URL: databaseUrl,
    SESSION_SECRET: secret,
    // Sync touches neither sign-in, mail nor photos: unreachable stand-ins suffice.
    OIDC_ISSUER: 'http://127.0.0.1:9/',
    OIDC_CLIENT_ID: 'bench',
    OIDC_CLIENT_SECRET: 'bench',
    OIDC_ALLOW_HTTP: 'true',
    S3_ENDPOINT: 'http://127.0.0.1:9',
    S3_BUCKET: 'bench',
    S3_ACCESS_KEY_ID: 'bench',
    S3_SECRET_ACCESS_KEY: 'bench',
    S3_FORCE_PATH_STYLE: 'true',
    SMTP_URL: 'smtp://127.0.0.1:9',
  };
}

const median = (values: number[]) => [...values].sort((a, b) => a - b)[values.length >> 1];

/**
 * The sync part of `npm run bench`: interviews per second accepted through `POST
 * /api/field/sync` by several devices at once against a real server process, beside a raw
 * `COPY` of the same rows into a copy of the interviews table (the ceiling), and their ratio.
 * Each is the median of three rounds, sync rounds with fresh interviews each time.
 */
export async function runSyncBench(
  context: BenchContext,
  size: SyncBenchSize = { devices: 4, batchesPerDevice: 5 },
): Promise<SyncBenchFigures> {
  const db = connectDatabase(context.databaseUrl, 2);
  const secret = randomBytes(32).toString('hex');
  const port = await freePort();
  let stop = async () => {};
  try {
    await applyMigrations(db);
    const study = await createBenchStudy(db, size.devices, secret);
    // Warm-up batches per device, then three timed rounds; all serialised before any timing.
    const perDevice = warmUpBatches + rounds * size.batchesPerDevice;
    const bodies = study.devices.map((device, d) =>
      benchBatches(study, device, perDevice, batchSize, 1000 + d).map(batchBody),
    );
    const server = await startServerProcess(serverEnv(context.databaseUrl, port, secret), true);
    stop = () => server.stop();
    const url = `http://127.0.0.1:${port}`;
    const slice = (from: number, count: number) =>
      bodies.map((own) => own.slice(from, from + count));
    await runDevices(url, study.devices, slice(0, warmUpBatches));
    // Where the rounds' CPU goes: the server process, the database's backends, this client.
    const backends = `postgres: ${new URL(context.databaseUrl).username} `;
    const cpuBefore = cpuSeconds(server.child.pid!, backends);
    const clientBefore = process.cpuUsage();
    let accepted = 0;
    const syncRates: number[] = [];
    for (let round = 0; round < rounds; round += 1) {
      const run = await runDevices(
        url,
        study.devices,
        slice(warmUpBatches + round * size.batchesPerDevice, size.batchesPerDevice),
      );
      syncRates.push(run.accepted / run.seconds);
      accepted += run.accepted;
      context.log(
        `sync round ${round + 1}: ${run.accepted} interviews by ${size.devices} devices in ${run.seconds.toFixed(2)} s`,
      );
    }
    const cpuAfter = cpuSeconds(server.child.pid!, backends);
    const client = process.cpuUsage(clientBefore);
    if (cpuBefore && cpuAfter) {
      const perInterview = (seconds: number) => (seconds * 1e6) / accepted;
      context.report(
        'sync-server-cpu-per-interview',
        perInterview(cpuAfter.tree - cpuBefore.tree),
        'µs',
      );
      context.report(
        'sync-database-cpu-per-interview',
        perInterview(cpuAfter.matching - cpuBefore.matching),
        'µs',
      );
    }
    context.report('sync-client-cpu-per-interview', (client.user + client.system) / accepted, 'µs');
    const rows = await exportInterviewRows(context.databaseUrl, study.studyId);
    const rowCount = rows.split('\n').filter(Boolean).length;
    const copyRate = async (withReferenceChecks: boolean) => {
      const rates: number[] = [];
      for (let round = 0; round < rounds; round += 1) {
        const seconds = await timeCopy(context.databaseUrl, rows, withReferenceChecks);
        rates.push(rowCount / seconds);
        const what = withReferenceChecks ? 'with reference checks' : 'plain';
        context.log(
          `COPY (${what}) round ${round + 1}: ${rowCount} rows in ${seconds.toFixed(3)} s`,
        );
      }
      return median(rates);
    };
    const copyRowsPerSecond = await copyRate(false);
    const copyCheckedPerSecond = await copyRate(true);
    const interviewsPerSecond = median(syncRates);
    const figures = {
      interviewsPerSecond,
      copyRowsPerSecond,
      ratio: interviewsPerSecond / copyRowsPerSecond,
    };
    context.report('sync-interviews-per-s', interviewsPerSecond, '1/s');
    context.report('sync-copy-rows-per-s', copyRowsPerSecond, '1/s');
    context.report('sync-copy-ratio', figures.ratio, 'x');
    // Context, not the target: the same COPY paying for the reference checks sync's writes pass.
    context.report('sync-copy-checked-rows-per-s', copyCheckedPerSecond, '1/s');
    context.report('sync-copy-checked-ratio', interviewsPerSecond / copyCheckedPerSecond, 'x');
    await db.$client.query('delete from interviews where study_id = $1', [study.studyId]);
    return figures;
  } finally {
    await stop();
    await db.$client.end();
  }
}

/** The sync part as the bench runner lists it (`npm run bench -- sync`). */
export const syncBench: BenchPart = {
  name: 'sync',
  run: (context) => runSyncBench(context).then(() => undefined),
};
