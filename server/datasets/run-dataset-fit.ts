import { createHash } from 'node:crypto';
import { and, eq, isNotNull, ne } from 'drizzle-orm';
import type { ColumnMapping } from '@shared/datasets/dataset-columns';
import type { DatasetFitResult } from '@shared/datasets/dataset-fit-resource';
import { datasetFitSpecSchema, type DatasetFitSpec } from '@shared/datasets/dataset-fit-spec';
import { EstimationError } from '@shared/estimation/estimation-error';
import type { Database } from '../db/database';
import { datasetFits, datasets } from '../db/schema';
import { fitDemandInDatabase } from '../estimation/demand/in-database-demand-fit';
import { datasetModelSpec } from './dataset-model-spec';

const deleted = {
  code: 'dataset-deleted',
  message: 'The dataset was deleted before the fit finished; nothing was stored.',
  field: 'datasetId',
};

/**
 * Runs one dataset fit: claims it, fits the model in the database over the dataset's table,
 * and stores the result with a data hash (the file's SHA-256 and the columns the model read:
 * a dataset never changes, so the two name exactly the rows used). A dataset deleted before or
 * during the fit leaves the fit failed with that reason and no result. Refusals of the data are
 * the fit's outcome; only unexpected failures are thrown, for the queue to retry.
 */
export async function runDatasetFit(db: Database, fitId: string): Promise<void> {
  const notDone = and(eq(datasetFits.id, fitId), ne(datasetFits.status, 'done'));
  const [claimed] = await db
    .update(datasetFits)
    .set({ status: 'running', progress: 5, error: null })
    .where(notDone)
    .returning();
  if (!claimed) return;
  const finish = (values: Partial<typeof datasetFits.$inferInsert>) =>
    db
      .update(datasetFits)
      .set({ ...values, finishedAt: new Date() })
      .where(notDone)
      .returning({ id: datasetFits.id });
  const [dataset] = claimed.datasetId
    ? await db.select().from(datasets).where(eq(datasets.id, claimed.datasetId))
    : [];
  if (!dataset || dataset.status !== 'imported') {
    await finish({ status: 'failed', error: dataset ? notImported : deleted });
    return;
  }
  try {
    const spec = datasetFitSpecSchema.parse(claimed.spec);
    const columns = dataset.columns as ColumnMapping[];
    const model = datasetModelSpec(dataset.id, columns, spec);
    const made = await fitDemandInDatabase(db, model);
    const result: DatasetFitResult = {
      ...made,
      dataset: {
        id: dataset.id,
        name: dataset.name,
        contentHash: dataset.contentHash,
        rowCount: dataset.rowCount,
      },
      engine: 'in-database',
    };
    const stored = await db
      .update(datasetFits)
      .set({
        status: 'done',
        progress: 100,
        result,
        dataHash: datasetFitHash(dataset.contentHash, columns, spec),
        finishedAt: new Date(),
      })
      .where(and(notDone, isNotNull(datasetFits.datasetId)))
      .returning({ id: datasetFits.id });
    if (stored.length === 0) await finish({ status: 'failed', error: deleted });
  } catch (error) {
    const [still] = await db
      .select({ id: datasets.id })
      .from(datasets)
      .where(eq(datasets.id, dataset.id));
    if (!still) {
      await finish({ status: 'failed', error: deleted });
      return;
    }
    if (error instanceof EstimationError) {
      await finish({
        status: 'failed',
        error: { code: error.code, message: error.message, field: error.field ?? null },
      });
      return;
    }
    console.error('[fieldcurve] dataset fit failed', error);
    await finish({
      status: 'failed',
      error: {
        code: 'internal',
        message: 'The fit failed on the server; it has been logged and will be retried.',
        field: null,
      },
    });
    throw error;
  }
}

const notImported = {
  code: 'dataset-not-imported',
  message: 'The dataset has not been imported (or its import failed); fit it once it is imported.',
  field: 'datasetId',
};

/** SHA-256 of the file's hash, the mapping of every column and the spec the fit read. */
export function datasetFitHash(
  contentHash: string,
  columns: readonly ColumnMapping[],
  spec: DatasetFitSpec,
): string {
  const canonical = JSON.stringify({ contentHash, columns, spec });
  return createHash('sha256').update(canonical, 'utf8').digest('hex');
}
