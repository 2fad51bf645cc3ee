import type PgBoss from 'pg-boss';
import type { Database } from '../db/database';
import { datasetQueueName, ensureDatasetQueue, type DatasetJobData } from './dataset-queue';
import { importDataset } from './import-dataset';
import { runDatasetFit } from './run-dataset-fit';
import { deleteExpiredUploads } from './upload-repository';

/** Abandoned uploads are looked for this often by every worker (a cheap indexed delete). */
const cleanupEveryMs = 10 * 60 * 1000;

/**
 * Makes a worker take dataset imports and fits from their queue, one at a time, and clear
 * away uploads nobody finished (their chunks go with them).
 */
export async function workDatasetJobs(boss: PgBoss, db: Database): Promise<void> {
  await ensureDatasetQueue(boss);
  await boss.work<DatasetJobData>(
    datasetQueueName,
    { batchSize: 1, pollingIntervalSeconds: 0.5 },
    async ([job]) =>
      job.data.kind === 'import' ? importDataset(db, job.data.id) : runDatasetFit(db, job.data.id),
  );
  const cleanup = () =>
    deleteExpiredUploads(db).catch((error) =>
      console.error('[fieldcurve] clearing expired uploads failed', error),
    );
  void cleanup();
  setInterval(cleanup, cleanupEveryMs).unref();
}
