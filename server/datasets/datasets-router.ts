import express, { Router } from 'express';
import { and, desc, eq } from 'drizzle-orm';
import { z } from 'zod';
import { datasetFitRequestSchema, type DatasetFitSpec } from '@shared/datasets/dataset-fit-spec';
import type { DatasetFitResource, DatasetFitResult } from '@shared/datasets/dataset-fit-resource';
import { datasetImportSchema } from '@shared/datasets/dataset-resource';
import { maxChunkBytes, uploadStartSchema } from '@shared/datasets/dataset-upload';
import type { AppDependencies } from '../app-dependencies';
import { actorOf } from '../auth/actor';
import type { Executor } from '../db/database';
import { datasetFits } from '../db/schema';
import { HttpError, notFound } from '../http/http-error';
import { validate } from '../http/validate';
import { sendDatasetJob } from './dataset-queue';
import { deleteDataset, findDataset, listDatasets } from './datasets-repository';
import { acceptImport, previewUpload } from './import-request';
import { appendChunk, startUpload, uploadState } from './upload-repository';

const idSchema = z.uuid();
const offsetSchema = z.coerce
  .number({ error: 'Give the byte offset of the chunk' })
  .int('A whole number of bytes')
  .min(0, 'Offsets start at 0');

/**
 * Datasets a researcher brings: announce a file, send its chunks (resumable from the server's
 * count), preview it, import it with a column mapping (a worker COPYs it in), list and delete
 * datasets, and fit demand models on them in the database.
 */
export function datasetsRouter(deps: AppDependencies): Router {
  const router = Router();
  const uploads = '/studies/:studyId/dataset-uploads';
  const sets = '/studies/:studyId/datasets';
  const queue = (kind: 'import' | 'fit', id: string) =>
    sendDatasetJob(deps.config.DATABASE_URL, { kind, id });

  router.post(uploads, async (req, res) => {
    const start = validate(uploadStartSchema, req.body);
    res
      .status(201)
      .json(await startUpload(deps.db, req.params.studyId, start, actorOf(res).userId));
  });

  router.get(`${uploads}/:uploadId`, async (req, res) => {
    const uploadId = validate(idSchema, req.params.uploadId, 'upload id');
    res.json(await uploadState(deps.db, req.params.studyId, uploadId));
  });

  router.put(
    `${uploads}/:uploadId`,
    express.raw({ type: () => true, limit: maxChunkBytes }),
    async (req, res) => {
      const uploadId = validate(idSchema, req.params.uploadId, 'upload id');
      const offset = validate(offsetSchema, req.query['offset'], 'offset');
      const body = Buffer.isBuffer(req.body) ? req.body : Buffer.alloc(0);
      res.json(await appendChunk(deps.db, req.params.studyId, uploadId, offset, body));
    },
  );

  router.get(`${uploads}/:uploadId/preview`, async (req, res) => {
    const uploadId = validate(idSchema, req.params.uploadId, 'upload id');
    res.json(await previewUpload(deps.db, req.params.studyId, uploadId));
  });

  router.post(sets, async (req, res) => {
    const request = validate(datasetImportSchema, req.body);
    const datasetId = await acceptImport(deps.db, req.params.studyId, request, actorOf(res).userId);
    await queue('import', datasetId);
    res.status(202).json({ datasetId });
  });

  router.get(sets, async (req, res) => {
    res.json(await listDatasets(deps.db, req.params.studyId));
  });

  router.get(`${sets}/:datasetId`, async (req, res) => {
    const datasetId = validate(idSchema, req.params.datasetId, 'dataset id');
    res.json(await findDataset(deps.db, req.params.studyId, datasetId));
  });

  router.delete(`${sets}/:datasetId`, async (req, res) => {
    const datasetId = validate(idSchema, req.params.datasetId, 'dataset id');
    await deleteDataset(deps.db, req.params.studyId, datasetId);
    res.status(204).end();
  });

  router.post(`${sets}/:datasetId/fits`, async (req, res) => {
    const datasetId = validate(idSchema, req.params.datasetId, 'dataset id');
    const { spec } = validate(datasetFitRequestSchema, req.body);
    const dataset = await findDataset(deps.db, req.params.studyId, datasetId);
    if (dataset.status !== 'imported') {
      throw new HttpError(
        409,
        'dataset-not-imported',
        'Fit the dataset once its import has finished.',
      );
    }
    const [row] = await deps.db
      .insert(datasetFits)
      .values({ studyId: req.params.studyId, datasetId, spec, createdBy: actorOf(res).userId })
      .returning({ id: datasetFits.id });
    await queue('fit', row.id);
    res.status(202).json({ fitId: row.id });
  });

  router.get(`${sets}/:datasetId/fits`, async (req, res) => {
    const datasetId = validate(idSchema, req.params.datasetId, 'dataset id');
    const rows = await deps.db
      .select()
      .from(datasetFits)
      .where(and(eq(datasetFits.studyId, req.params.studyId), eq(datasetFits.datasetId, datasetId)))
      .orderBy(desc(datasetFits.createdAt));
    res.json(rows.map(fitResource));
  });

  router.get('/studies/:studyId/dataset-fits/:fitId', async (req, res) => {
    const fitId = validate(idSchema, req.params.fitId, 'fit id');
    res.json(await findDatasetFit(deps.db, req.params.studyId, fitId));
  });

  return router;
}

async function findDatasetFit(db: Executor, studyId: string, fitId: string) {
  const [row] = await db
    .select()
    .from(datasetFits)
    .where(and(eq(datasetFits.id, fitId), eq(datasetFits.studyId, studyId)));
  if (!row) throw notFound('That fit');
  return fitResource(row);
}

function fitResource(row: typeof datasetFits.$inferSelect): DatasetFitResource {
  return {
    id: row.id,
    studyId: row.studyId,
    datasetId: row.datasetId,
    spec: row.spec as DatasetFitSpec,
    status: row.status,
    progress: row.progress,
    result: (row.result as DatasetFitResult | null) ?? null,
    error: (row.error as DatasetFitResource['error']) ?? null,
    dataHash: row.dataHash,
    createdAt: row.createdAt.toISOString(),
    finishedAt: row.finishedAt?.toISOString() ?? null,
  };
}
