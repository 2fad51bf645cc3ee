import { randomBytes, randomUUID } from 'node:crypto';
import signature from 'cookie-signature';
import { sql } from 'drizzle-orm';
import type { Database } from '../../server/db/database';
import {
  datasets,
  memberships,
  organisations,
  sessions,
  studies,
  studyMembers,
  users,
} from '../../server/db/schema';
import { datasetSchema, datasetTableName } from '../../server/datasets/dataset-table-name';
import { sessionCookieName } from '../../server/http/session-middleware';

/** A researcher's signed session in a fresh study, as the API sees a signed-in browser. */
export interface BenchResearcher {
  studyId: string;
  userId: string;
  cookie: string;
  csrfToken: string;
}

export async function createBenchResearcher(
  db: Database,
  secret: string,
): Promise<BenchResearcher> {
  const [organisation] = await db
    .insert(organisations)
    .values({ name: `Dataset bench ${randomUUID().slice(0, 8)}` })
    .returning({ id: organisations.id });
  const [user] = await db
    .insert(users)
    .values({ email: `bench.${randomUUID()}@example.test`, name: 'Bench researcher' })
    .returning({ id: users.id });
  await db
    .insert(memberships)
    .values({ organisationId: organisation.id, userId: user.id, roles: ['researcher'] });
  const [study] = await db
    .insert(studies)
    .values({
      organisationId: organisation.id,
      name: 'Bench sales',
      productName: 'Invented lamp',
      currency: 'KES',
      locale: 'en-KE',
      market: 'Invented outlets',
      targetSample: 100,
      priceMinMinor: 1000,
      priceMaxMinor: 10000,
      status: 'draft',
    })
    .returning({ id: studies.id });
  await db
    .insert(studyMembers)
    .values({ studyId: study.id, userId: user.id, roles: ['researcher'] });
  const sid = randomUUID();
  const csrfToken = randomBytes(32).toString('base64url');
  const expire = new Date(Date.now() + 3 * 60 * 60 * 1000);
  await db.insert(sessions).values({
    sid,
    expire,
    sess: {
      cookie: {
        originalMaxAge: 10800000,
        expires: expire.toISOString(),
        httpOnly: true,
        path: '/',
      },
      userId: user.id,
      organisationId: organisation.id,
      csrfToken,
    },
  });
  const cookie = `${sessionCookieName}=${encodeURIComponent(`s:${signature.sign(sid, secret)}`)}`;
  return { studyId: study.id, userId: user.id, cookie, csrfToken };
}

/** Covariates of the bench sales table beside price and units: five, so six regressors. */
export const benchCovariates = ['income', 'rival_price', 'shelf_space', 'footfall', 'distance'];

/** The bench sales table as CSV text: header and `rows` rows, seeded. */
export function benchSalesCsv(rows: number): Buffer {
  let state = 12345;
  const uniform = () => {
    state = (state * 1103515245 + 12345) % 2147483648;
    return state / 2147483648;
  };
  const parts: string[] = [`outlet,price,units,${benchCovariates.join(',')}\n`];
  for (let i = 0; i < rows; i++) {
    const values = [
      (20 + 10 * uniform()).toFixed(2),
      String(1 + Math.floor(200 * uniform())),
      ...benchCovariates.map(() => (1 + 50 * uniform()).toFixed(3)),
    ];
    parts.push(`O${i % 300},${values.join(',')}\n`);
  }
  return Buffer.from(parts.join(''));
}

/** The mapping of the bench sales table. */
export const benchMapping = [
  { source: 'outlet', name: 'outlet', role: 'grouping', type: 'text' },
  { source: 'price', name: 'price', role: 'price', type: 'number' },
  { source: 'units', name: 'units', role: 'quantity', type: 'number' },
  ...benchCovariates.map((name) => ({ source: name, name, role: 'covariate', type: 'number' })),
];

/**
 * An imported dataset of `rows` rows made directly in SQL (generate_series, seeded): the same
 * table an import would have made, so the fit can be timed on 10M rows without 10M rows of
 * upload first.
 */
export async function seedBenchDataset(
  db: Database,
  studyId: string,
  userId: string,
  rows: number,
) {
  const [dataset] = await db
    .insert(datasets)
    .values({
      studyId,
      name: `Seeded sales ${rows}`,
      fileName: 'seeded.csv',
      status: 'imported',
      columns: benchMapping,
      contentHash: `seeded-${randomUUID()}`,
      rowCount: rows,
      totalBytes: 0,
      importedBy: userId,
      importedAt: new Date(),
    })
    .returning({ id: datasets.id });
  const table = sql`${sql.identifier(datasetSchema)}.${sql.identifier(datasetTableName(dataset.id))}`;
  const covariates = benchCovariates.map((c) => sql.identifier(c));
  await db.execute(sql`CREATE TABLE ${table} (line integer NOT NULL, outlet text, price float8,
    units float8, ${sql.join(
      covariates.map((c) => sql`${c} float8`),
      sql`, `,
    )})`);
  await db.transaction(async (tx) => {
    await tx.execute(sql`SELECT setseed(0.17)`);
    await tx.execute(sql`INSERT INTO ${table}
      SELECT g + 1, 'O' || (g % 300), p, exp(4 - 1.3 * ln(p) + 0.2 * (random() - 0.5)) ,
             ${sql.join(
               covariates.map(() => sql`1 + 50 * random()`),
               sql`, `,
             )}
      FROM (SELECT g, 20 + 10 * random() AS p FROM generate_series(1, ${rows}) AS g) AS s`);
  });
  await db.execute(sql`VACUUM ANALYZE ${table}`);
  return { datasetId: dataset.id, table };
}
