import { Router } from 'express';
import { sql } from 'drizzle-orm';
import type { HealthReport } from '@shared/health/health-report';
import type { AppDependencies } from '../app-dependencies';
import { bucketReachable } from '../storage/object-storage';
import { probe } from './probe';

/** `GET /api/health`: database, object store, mail relay and identity provider, probed in parallel. */
export function healthRouter({ db, storage, mailer, identity }: AppDependencies): Router {
  const router = Router();
  router.get('/health', async (_req, res) => {
    const [database, objectStore, mail, identityProvider] = await Promise.all([
      probe(async () => {
        const result = await db.execute<{ version: string }>(sql`select version() as version`);
        return result.rows[0]?.version.split(' ').slice(0, 2).join(' ') ?? 'connected';
      }),
      probe(async () => {
        await bucketReachable(storage);
        return `bucket ${storage.bucket} reachable`;
      }),
      probe(async () => {
        await mailer.check();
        return 'SMTP relay answered';
      }),
      probe(async () => {
        const configuration = await identity.discover();
        return `issuer ${configuration.serverMetadata().issuer}`;
      }),
    ]);
    const checks = { database, objectStore, mail, identityProvider };
    const body: HealthReport = {
      status: Object.values(checks).every((c) => c.ok) ? 'ok' : 'degraded',
      checks,
    };
    res.status(body.status === 'ok' ? 200 : 503).json(body);
  });
  return router;
}
