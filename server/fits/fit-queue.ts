import PgBoss from 'pg-boss';
import { logger } from '../http/logger';

/** The queue fit jobs wait in; every worker process takes jobs from it. */
export const fitQueueName = 'fieldcurve-fits';

/** pg-boss keeps its tables in their own schema of the app's database. */
export const jobSchema = 'fieldcurve_jobs';

/** What a fit job carries: only the fit's id; the spec and data are read when it runs. */
export interface FitJobData {
  fitId: string;
}

/**
 * A pg-boss instance on the app's database. The web server only sends (no maintenance), the
 * workers supervise: expire stuck jobs, retry and archive.
 */
export function createJobBoss(databaseUrl: string, role: 'sender' | 'worker'): PgBoss {
  const boss = new PgBoss({
    connectionString: databaseUrl,
    schema: jobSchema,
    max: role === 'worker' ? 3 : 2,
    supervise: role === 'worker',
    schedule: false,
    application_name: `fieldcurve-${role}`,
  });
  boss.on('error', (error) => logger.error({ err: error, role }, 'job queue error'));
  return boss;
}

/** Creates the fit queue if it is missing (concurrent calls are safe: pg-boss ignores repeats). */
export async function ensureFitQueue(boss: PgBoss): Promise<void> {
  await boss.createQueue(fitQueueName, {
    name: fitQueueName,
    retryLimit: 2,
    retryDelay: 5,
    expireInSeconds: 15 * 60,
  });
}
