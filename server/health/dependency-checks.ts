import { sql } from 'drizzle-orm';
import type { HealthReport } from '@shared/health/health-report';
import type { AppDependencies } from '../app-dependencies';
import { bucketReachable } from '../storage/object-storage';
import { probe } from './probe';

/** Database, object store, mail relay and identity provider, probed in parallel. */
export async function checkDependencies({
  db,
  storage,
  mailer,
  identity,
}: AppDependencies): Promise<HealthReport> {
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
  return { status: Object.values(checks).every((c) => c.ok) ? 'ok' : 'degraded', checks };
}
