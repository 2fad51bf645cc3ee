import { asc, eq, sql } from 'drizzle-orm';
import type { SamplingPoint, SamplingPointInput } from '@shared/sampling/sampling-point';
import type { SamplingPointKind } from '@shared/sampling/sampling-point-kind';
import type { Database, Executor } from '../db/database';
import { samplingPoints } from '../db/schema';

type PointRow = typeof samplingPoints.$inferSelect;

function toSamplingPoint(row: PointRow): SamplingPoint {
  return {
    id: row.id,
    code: row.code,
    name: row.name,
    kind: row.kind as SamplingPointKind,
    latitude: row.latitude,
    longitude: row.longitude,
    stratum: row.stratum,
    notes: row.notes,
    updatedAt: row.updatedAt.toISOString(),
  };
}

export async function listSamplingPoints(db: Executor, studyId: string): Promise<SamplingPoint[]> {
  const rows = await db
    .select()
    .from(samplingPoints)
    .where(eq(samplingPoints.studyId, studyId))
    .orderBy(asc(samplingPoints.code));
  return rows.map(toSamplingPoint);
}

/** Rows per INSERT statement: far below PostgreSQL's limit of 65 535 parameters. */
const batchSize = 1000;
const fromFile = (column: string) => sql.raw(`excluded.${column}`);

/**
 * Inserts new codes and updates changed points, keyed by (study, code), so re-uploading a file
 * never duplicates a point. A point whose values are all the same is not touched (its
 * `updated_at` stays), which is how the unchanged ones are counted. Points missing from the file
 * are kept: routes may visit them. Call inside a transaction for all-or-nothing.
 */
export async function upsertSamplingPoints(
  db: Executor,
  studyId: string,
  points: readonly SamplingPointInput[],
): Promise<{ created: number; updated: number; unchanged: number }> {
  let created = 0;
  let touched = 0;
  for (let start = 0; start < points.length; start += batchSize) {
    const batch = points.slice(start, start + batchSize).map((p) => ({ ...p, studyId }));
    const written = await db
      .insert(samplingPoints)
      .values(batch)
      .onConflictDoUpdate({
        target: [samplingPoints.studyId, samplingPoints.code],
        set: {
          name: fromFile('name'),
          kind: fromFile('kind'),
          latitude: fromFile('latitude'),
          longitude: fromFile('longitude'),
          stratum: fromFile('stratum'),
          notes: fromFile('notes'),
          updatedAt: sql`now()`,
        },
        setWhere: sql`(sampling_points.name, sampling_points.kind, sampling_points.latitude,
          sampling_points.longitude, sampling_points.stratum, sampling_points.notes)
          is distinct from (excluded.name, excluded.kind, excluded.latitude,
          excluded.longitude, excluded.stratum, excluded.notes)`,
      })
      // xmax is 0 on a freshly inserted row version and non-zero on one an upsert updated.
      .returning({ inserted: sql<boolean>`(xmax = 0)` });
    touched += written.length;
    created += written.filter((row) => row.inserted).length;
  }
  return { created, updated: touched - created, unchanged: points.length - touched };
}

/** Imports a whole file in one transaction and answers with the counts and the full list. */
export async function importSamplingPoints(
  db: Database,
  studyId: string,
  points: readonly SamplingPointInput[],
) {
  return db.transaction(async (tx) => {
    const counts = await upsertSamplingPoints(tx, studyId, points);
    return { ...counts, points: await listSamplingPoints(tx, studyId) };
  });
}
