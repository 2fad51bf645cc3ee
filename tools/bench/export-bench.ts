import { sql } from 'drizzle-orm';
import { randomBytes, randomUUID } from 'node:crypto';
import signature from 'cookie-signature';
import { rawDataPath, rawDataQuery } from '../../shared/raw-data/raw-data-request';
import { connectDatabase, type Database } from '../../server/db/database';
import { applyMigrations } from '../../server/db/migrate';
import { sessions } from '../../server/db/schema';
import { sessionCookieName } from '../../server/http/session-middleware';
import { insertManyInterviews } from '../../tests/support/many-interviews';
import { insertRawDataStudy } from '../../tests/support/raw-data-study';
import { createTestOrganisation } from '../../tests/support/test-organisation';
import { freePort } from '../stack/free-port';
import { startServerProcess } from '../stack/server-process';
import type { BenchContext, BenchPart } from './bench-part';

const INTERVIEWS = 200_000;

/** The environment of a real server process; only the database is real, photo links are signed locally. */
function serverEnv(databaseUrl: string, port: number, secret: string): Record<string, string> {
  return {
    HOST: '127.0.0.1',
    PORT: String(port),
    APP_URL: `http://127.0.0.1:${port}`,
    DATABASE_URL: databaseUrl,
    SESSION_SECRET: secret,
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

/** A signed session cookie for `userId`, written as the sign-in callback would. */
async function sessionCookie(db: Database, userId: string, organisationId: string, secret: string) {
  const sid = randomUUID();
  const expire = new Date(Date.now() + 60 * 60 * 1000);
  await db.insert(sessions).values({
    sid,
    expire,
    sess: {
      cookie: { originalMaxAge: 3600000, expires: expire.toISOString(), httpOnly: true, path: '/' },
      userId,
      organisationId,
      csrfToken: randomBytes(32).toString('base64url'),
    },
  });
  return `${sessionCookieName}=${encodeURIComponent(`s:${signature.sign(sid, secret)}`)}`;
}

/** Downloads `url` to the end, keeping nothing; the rows per second of the whole request. */
async function rowsPerSecond(url: string, cookie: string, rows: number): Promise<number> {
  const started = performance.now();
  const response = await fetch(url, { headers: { cookie } });
  if (response.status !== 200) throw new Error(`the download answered ${response.status}`);
  for await (const chunk of response.body as unknown as AsyncIterable<Uint8Array>) void chunk;
  return rows / ((performance.now() - started) / 1000);
}

/**
 * Raw-data export speed: interviews per second through `GET …/raw-data/interviews.csv` and
 * `.xlsx` from a real server process, API request to the last byte, on 200,000 interviews.
 */
export const exportBench: BenchPart = {
  name: 'export',
  async run(context: BenchContext) {
    const db = connectDatabase(context.databaseUrl, 2);
    const secret = randomBytes(32).toString('hex');
    const port = await freePort();
    let stop = async () => {};
    try {
      await applyMigrations(db);
      const organisation = await createTestOrganisation(db, 'Bench export');
      const study = await insertRawDataStudy(db, organisation);
      await insertManyInterviews(db, study, organisation.people.enumerator.userId, INTERVIEWS);
      await db.execute(sql`ANALYZE interviews`);
      const cookie = await sessionCookie(
        db,
        organisation.people.researcher.userId,
        organisation.id,
        secret,
      );
      const server = await startServerProcess(serverEnv(context.databaseUrl, port, secret), true);
      stop = () => server.stop();
      const query = rawDataQuery({ filter: { flagged: 'include' } });
      const url = (format: 'csv' | 'xlsx') =>
        `http://127.0.0.1:${port}${rawDataPath(study.studyId, format)}?${query}`;
      const rows = INTERVIEWS + 5;
      context.report('export-rows-per-s', await rowsPerSecond(url('csv'), cookie, rows), 'rows/s');
      context.report(
        'export-xlsx-rows-per-s',
        await rowsPerSecond(url('xlsx'), cookie, rows),
        'rows/s',
      );
    } finally {
      await stop();
      await db.$client.end();
    }
  },
};
