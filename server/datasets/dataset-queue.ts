import type PgBoss from 'pg-boss';
import { createJobBoss } from '../fits/fit-queue';

/** The queue of dataset work: imports and fits of brought datasets, taken by the workers. */
export const datasetQueueName = 'fieldcurve-datasets';

/** What a dataset job carries: what to do, and the id of the dataset or fit it concerns. */
export interface DatasetJobData {
  kind: 'import' | 'fit';
  id: string;
}

export async function ensureDatasetQueue(boss: PgBoss): Promise<void> {
  await boss.createQueue(datasetQueueName, {
    name: datasetQueueName,
    retryLimit: 2,
    retryDelay: 5,
    // A 10-million-row import or fit takes minutes, not hours.
    expireInSeconds: 60 * 60,
  });
}

const senders = new Map<string, Promise<PgBoss>>();

/** Queues one dataset job (once per id), starting this process's sender on first use. */
export async function sendDatasetJob(databaseUrl: string, data: DatasetJobData): Promise<void> {
  let ready = senders.get(databaseUrl);
  if (!ready) {
    const boss = createJobBoss(databaseUrl, 'sender');
    ready = boss.start().then(async () => {
      await ensureDatasetQueue(boss);
      return boss;
    });
    senders.set(databaseUrl, ready);
  }
  const boss = await ready;
  await boss.send(datasetQueueName, data, { id: data.id, singletonKey: data.id });
}

/** Stops the senders this process started (at shutdown, and after API tests). */
export async function stopDatasetSenders(): Promise<void> {
  const running = [...senders.values()];
  senders.clear();
  await Promise.all(
    running.map(async (ready) => {
      const boss = await ready.catch(() => null);
      await boss?.stop({ graceful: false, wait: true, close: true });
    }),
  );
}
