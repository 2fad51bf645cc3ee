import { randomBytes } from 'node:crypto';
import { connectDatabase } from '../../server/db/database';
import { applyMigrations } from '../../server/db/migrate';
import { freePort } from '../stack/free-port';
import { startServerProcess } from '../stack/server-process';
import type { BenchPart } from './bench-part';
import { serverEnv } from './sync-bench';
import { benchBatches } from './sync-bench-interviews';
import { batchBody } from './sync-bench-load';
import { createBenchStudy, insertBenchMember, type BenchDevice } from './sync-bench-setup';

const devices = 50;
const batchSize = 5;
const durationMs = 30_000;
/** More than a device can send in the run at the fastest rate seen; a device that runs out stops. */
const batchesPerDevice = 160;
/** The reader's pause between two polls, as a supervisor's open study page refreshing. */
const pollPauseMs = 100;

/** The nearest-rank percentile (common practice for latency figures). */
function percentile(values: number[], p: number): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)] ?? NaN;
}

const elapsedMs = (since: bigint) => Number(process.hrtime.bigint() - since) / 1e6;
const pause = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

interface DeviceRun {
  latencies: number[];
  accepted: number;
  /** 429/503 answers: the device waited `Retry-After` and sent the same batch again. */
  turnedAway: number;
}

/** One device sending its batches back to back until the clock runs out. */
async function runDevice(
  url: string,
  device: BenchDevice,
  bodies: string[],
  until: number,
): Promise<DeviceRun> {
  const run: DeviceRun = { latencies: [], accepted: 0, turnedAway: 0 };
  let next = 0;
  while (Date.now() < until && next < bodies.length) {
    const started = process.hrtime.bigint();
    const response = await fetch(`${url}/api/field/sync`, {
      method: 'POST',
      headers: {
        Cookie: device.cookie,
        'x-csrf-token': device.csrfToken,
        'Content-Type': 'application/json',
      },
      body: bodies[next],
    });
    const text = await response.text();
    run.latencies.push(elapsedMs(started));
    if (response.status === 429 || response.status === 503) {
      run.turnedAway += 1;
      await pause(Number(response.headers.get('retry-after') ?? 1) * 1000);
      continue;
    }
    if (response.status !== 200) throw new Error(`sync answered ${response.status}: ${text}`);
    const { results } = JSON.parse(text) as { results: { outcome: string }[] };
    run.accepted += results.filter((r) => r.outcome === 'accepted').length;
    next += 1;
  }
  return run;
}

/** A supervisor's study page polled while the devices sync: each poll's latency. */
async function runReader(url: string, cookie: string, paths: string[], until: number) {
  const latencies: Record<string, number[]> = Object.fromEntries(paths.map((p) => [p, []]));
  while (Date.now() < until) {
    for (const path of paths) {
      const started = process.hrtime.bigint();
      const response = await fetch(`${url}${path}`, { headers: { Cookie: cookie } });
      await response.arrayBuffer();
      if (response.status !== 200) throw new Error(`${path} answered ${response.status}`);
      latencies[path].push(elapsedMs(started));
    }
    await pause(pollPauseMs);
  }
  return latencies;
}

/**
 * `npm run bench -- sync-load`: fifty simulated devices send five-interview batches for thirty
 * seconds against a real server process while a supervisor's study page is polled; reports the
 * read and sync p99 latencies (targets: read under 250 ms, sync under 1,000 ms on a two-core
 * machine) and the interviews stored per second beside them.
 */
export const syncLoadBench: BenchPart = {
  name: 'sync-load',
  run: async (context) => {
    const db = connectDatabase(context.databaseUrl, 2);
    const secret = randomBytes(32).toString('hex');
    const port = await freePort();
    let stop = async () => {};
    try {
      await applyMigrations(db);
      const study = await createBenchStudy(db, devices, secret);
      const reader = await insertBenchMember(
        db,
        study.organisationId,
        study.studyId,
        secret,
        'supervisor',
      );
      const bodies = study.devices.map((device, d) =>
        benchBatches(study, device, batchesPerDevice, batchSize, 5000 + d).map(batchBody),
      );
      const server = await startServerProcess(
        {
          ...serverEnv(context.databaseUrl, port, secret),
          // The per-person sync limit protects against a runaway device; here every device is
          // meant to push as hard as it can, so the limit is lifted and the gate alone decides.
          RATE_SYNC_PER_USER: '1000000',
          RATE_WRITES_PER_USER: '1000000',
        },
        true,
      );
      stop = () => server.stop();
      const url = `http://127.0.0.1:${port}`;
      const studyPage = `/api/studies/${study.studyId}`;
      const progress = `/api/studies/${study.studyId}/progress`;
      // Warm-up: each device one batch, the page a few times, outside the timed run.
      await Promise.all(
        study.devices.map((device, d) => runDevice(url, device, bodies[d].slice(0, 1), Infinity)),
      );
      await runReader(url, reader.cookie, [studyPage, progress], Date.now() + 500);

      const until = Date.now() + durationMs;
      const started = process.hrtime.bigint();
      const [reads, ...runs] = await Promise.all([
        runReader(url, reader.cookie, [studyPage, progress], until),
        ...study.devices.map((device, d) => runDevice(url, device, bodies[d].slice(1), until)),
      ]);
      const seconds = elapsedMs(started) / 1000;
      const syncLatencies = runs.flatMap((r) => r.latencies);
      const accepted = runs.reduce((sum, r) => sum + r.accepted, 0);
      const turnedAway = runs.reduce((sum, r) => sum + r.turnedAway, 0);
      context.log(
        `${devices} devices: ${syncLatencies.length} sync calls (${turnedAway} told to come back later), ${accepted} interviews in ${seconds.toFixed(1)} s; ${reads[studyPage].length} study-page reads`,
      );
      context.report('sync-read-p99-ms', percentile(reads[studyPage], 99), 'ms');
      context.report('sync-p99-ms', percentile(syncLatencies, 99), 'ms');
      context.report('sync-load-interviews-per-s', accepted / seconds, '1/s');
      // Context: the progress figures on the same page, and the median read.
      context.report('sync-read-p50-ms', percentile(reads[studyPage], 50), 'ms');
      context.report('sync-progress-read-p99-ms', percentile(reads[progress], 99), 'ms');
      context.report('sync-load-turned-away', turnedAway, 'calls');
      await db.$client.query('delete from interviews where study_id = $1', [study.studyId]);
    } finally {
      await stop();
      await db.$client.end();
    }
  },
};
