import type PgBoss from 'pg-boss';
import { createJobBoss, ensureFitQueue, fitQueueName, type FitJobData } from './fit-queue';

/** Puts fits on the queue for the workers; started on first use. */
export interface FitSender {
  /** True when a new job was queued; false when the fit's job was already there. */
  send(fitId: string): Promise<boolean>;
  stop(): Promise<void>;
}

const senders = new Map<string, { boss: PgBoss; ready: Promise<void> }>();

/**
 * The process's sender for one database (one pg-boss client per process, started lazily so an
 * app that never fits never opens its connections). The job id is the fit id, so sending the
 * same fit twice queues it once.
 */
export function fitSender(databaseUrl: string): FitSender {
  const start = () => {
    let entry = senders.get(databaseUrl);
    if (!entry) {
      const boss = createJobBoss(databaseUrl, 'sender');
      entry = { boss, ready: boss.start().then(() => ensureFitQueue(boss)) };
      senders.set(databaseUrl, entry);
    }
    return entry;
  };
  return {
    async send(fitId) {
      const { boss, ready } = start();
      await ready;
      const data: FitJobData = { fitId };
      return (await boss.send(fitQueueName, data, { id: fitId, singletonKey: fitId })) !== null;
    },
    stop: () => stopFitSenders(),
  };
}

/** Stops every sender this process started (at shutdown, and after API tests). */
export async function stopFitSenders(): Promise<void> {
  const running = [...senders.values()];
  senders.clear();
  await Promise.all(
    running.map(async ({ boss, ready }) => {
      await ready.catch(() => undefined);
      await boss.stop({ graceful: false, wait: true, close: true });
    }),
  );
}
