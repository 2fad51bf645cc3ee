import { and, desc, eq, sql } from 'drizzle-orm';
import type { ColumnMapping } from '@shared/datasets/dataset-columns';
import type { DatasetResource, ImportProblem } from '@shared/datasets/dataset-resource';
import type { Executor } from '../db/database';
import { datasets, users } from '../db/schema';
import { HttpError, notFound } from '../http/http-error';

function datasetRows(db: Executor, studyId: string, datasetId?: string) {
  return db
    .select({ dataset: datasets, importedBy: users.name })
    .from(datasets)
    .leftJoin(users, eq(users.id, datasets.importedBy))
    .where(and(eq(datasets.studyId, studyId), datasetId ? eq(datasets.id, datasetId) : undefined))
    .orderBy(desc(datasets.createdAt));
}

type DatasetRow = Awaited<ReturnType<typeof datasetRows>>[number];

function toResource({ dataset, importedBy }: DatasetRow): DatasetResource {
  return {
    id: dataset.id,
    studyId: dataset.studyId,
    name: dataset.name,
    fileName: dataset.fileName,
    status: dataset.status,
    rowCount: dataset.rowCount,
    bytesRead: dataset.bytesRead,
    totalBytes: dataset.totalBytes,
    columns: dataset.columns as ColumnMapping[],
    contentHash: dataset.contentHash,
    problems: dataset.problems as ImportProblem[],
    importedBy,
    createdAt: dataset.createdAt.toISOString(),
    importedAt: dataset.importedAt?.toISOString() ?? null,
  };
}

export async function listDatasets(db: Executor, studyId: string): Promise<DatasetResource[]> {
  return (await datasetRows(db, studyId)).map(toResource);
}

export async function findDataset(
  db: Executor,
  studyId: string,
  datasetId: string,
): Promise<DatasetResource> {
  const [row] = await datasetRows(db, studyId, datasetId);
  if (!row) throw notFound('That dataset');
  return toResource(row);
}

/**
 * Deletes a dataset and (by trigger) its table — refused while a published schedule was made
 * from a fit of it. Fits of it keep their results and lose the link.
 */
export async function deleteDataset(db: Executor, studyId: string, datasetId: string) {
  await findDataset(db, studyId, datasetId);
  const published = await db.execute(
    sql`SELECT 1 FROM schedule_versions WHERE study_id = ${studyId}
          AND spec->>'datasetId' = ${datasetId} LIMIT 1`,
  );
  if (published.rows.length > 0) {
    throw new HttpError(
      409,
      'dataset-in-use',
      'A published demand schedule rests on this dataset, so it cannot be deleted.',
    );
  }
  await db.delete(datasets).where(and(eq(datasets.id, datasetId), eq(datasets.studyId, studyId)));
}
