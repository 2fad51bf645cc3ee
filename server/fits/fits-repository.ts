import { and, desc, eq, type SQL } from 'drizzle-orm';
import type { FitResource, FitSummary } from '@shared/analysis/fit-resource';
import type { FitResult } from '@shared/analysis/fit-result';
import type { FitSpec } from '@shared/analysis/fit-spec';
import type { Executor } from '../db/database';
import { fits, users } from '../db/schema';
import { notFound } from '../http/http-error';

function fitRows(db: Executor, where: SQL | undefined) {
  return db
    .select({
      id: fits.id,
      studyId: fits.studyId,
      spec: fits.spec,
      status: fits.status,
      progress: fits.progress,
      result: fits.result,
      error: fits.error,
      dataHash: fits.dataHash,
      createdBy: users.name,
      createdAt: fits.createdAt,
      startedAt: fits.startedAt,
      finishedAt: fits.finishedAt,
    })
    .from(fits)
    .leftJoin(users, eq(users.id, fits.createdBy))
    .where(where)
    .orderBy(desc(fits.createdAt));
}

type FitRow = Awaited<ReturnType<typeof fitRows>>[number];

function toResource(row: FitRow): FitResource {
  return {
    id: row.id,
    studyId: row.studyId,
    spec: row.spec as FitSpec,
    status: row.status,
    progress: row.progress,
    result: (row.result as FitResult | null) ?? null,
    error: (row.error as FitResource['error']) ?? null,
    dataHash: row.dataHash,
    createdBy: row.createdBy,
    createdAt: row.createdAt.toISOString(),
    startedAt: row.startedAt?.toISOString() ?? null,
    finishedAt: row.finishedAt?.toISOString() ?? null,
  };
}

/** Stores a new fit, queued. */
export async function insertFit(
  db: Executor,
  studyId: string,
  spec: FitSpec,
  createdBy: string,
): Promise<string> {
  const [row] = await db
    .insert(fits)
    .values({ studyId, spec, createdBy })
    .returning({ id: fits.id });
  return row.id;
}

/** The study's fits, newest first, without their results. */
export async function listFits(db: Executor, studyId: string): Promise<FitSummary[]> {
  const rows = await fitRows(db, eq(fits.studyId, studyId));
  return rows.map((row) => {
    const { result, ...summary } = toResource(row);
    return { ...summary, n: result?.n ?? null, hasSchedule: Boolean(result?.schedule) };
  });
}

/** One fit of the study with its result; 404 when it is not this study's. */
export async function findFit(db: Executor, studyId: string, fitId: string): Promise<FitResource> {
  const [row] = await fitRows(db, and(eq(fits.id, fitId), eq(fits.studyId, studyId)));
  if (!row) throw notFound('That fit');
  return toResource(row);
}
