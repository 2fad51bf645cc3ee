import { hostname } from 'node:os';
import { loadConfig } from './config';
import { connectDatabase } from './db/database';
import { createJobBoss, ensureFitQueue, fitQueueName, type FitJobData } from './fits/fit-queue';
import { runFitJob } from './fits/run-fit-job';
import { workDatasetJobs } from './datasets/dataset-worker';

/**
 * A fit worker: takes fit jobs from the queue one at a time and runs them. Start as many as the
 * machines allow (compiled to `dist/server/worker.mjs`); they share one queue in PostgreSQL.
 */
const config = loadConfig();
const db = connectDatabase(config.DATABASE_URL, 3);
const boss = createJobBoss(config.DATABASE_URL, 'worker');
const workerId = `${hostname()}:${process.pid}`;

await boss.start();
await ensureFitQueue(boss);
await boss.work<FitJobData>(
  fitQueueName,
  { batchSize: 1, pollingIntervalSeconds: 0.5 },
  async ([job]) => runFitJob(db, job.data.fitId, workerId),
);
await workDatasetJobs(boss, db);
console.log(`[fieldcurve-worker] ready ${workerId}`);

// Let the job in hand finish, then release the queue and the database.
async function shutDown(signal: string) {
  console.log(`[fieldcurve-worker] ${signal}: finishing the job in hand`);
  setTimeout(() => process.exit(1), 20_000).unref();
  await boss.stop({ graceful: true, wait: true, timeout: 15_000 });
  await db.$client.end();
  process.exit(0);
}
process.on('SIGTERM', () => void shutDown('SIGTERM'));
process.on('SIGINT', () => void shutDown('SIGINT'));
