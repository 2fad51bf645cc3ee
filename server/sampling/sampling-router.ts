import express, { Router } from 'express';
import { z } from 'zod';
import { parseSamplingPointsCsv } from '@shared/sampling/parse-sampling-points-csv';
import {
  samplingImportRequestSchema,
  type SamplingImportRejection,
  type SamplingImportResult,
} from '@shared/sampling/sampling-point';
import type { AppDependencies } from '../app-dependencies';
import { validate } from '../http/validate';
import { importSamplingPoints, listSamplingPoints } from './sampling-points-repository';

const studyParams = z.object({ studyId: z.uuid('The study id must be a UUID') });

/** The file arrives either as the raw body (`text/csv`) or as JSON `{ csv }`. */
const csvBody = express.text({ type: ['text/csv', 'text/plain'], limit: '2mb' });

function csvTextOf(body: unknown): string {
  if (typeof body === 'string') return body;
  return validate(samplingImportRequestSchema, body ?? {}).csv;
}

/** Sampling points of a study; the access policy limits who may call each route. */
export function samplingRouter({ db }: AppDependencies): Router {
  const router = Router();

  router.get('/studies/:studyId/sampling-points', async (req, res) => {
    const { studyId } = validate(studyParams, req.params, 'path');
    res.json(await listSamplingPoints(db, studyId));
  });

  router.post('/studies/:studyId/sampling-points/import', csvBody, async (req, res) => {
    const { studyId } = validate(studyParams, req.params, 'path');
    const parsed = parseSamplingPointsCsv(csvTextOf(req.body));
    if (!parsed.ok) {
      const count = parsed.problems.length;
      const body: SamplingImportRejection = {
        error: {
          code: 'invalid-csv',
          message: `Nothing was imported: the file has ${count} problem${count === 1 ? '' : 's'}. Fix ${count === 1 ? 'it' : 'them'} and upload the file again.`,
          problems: parsed.problems,
        },
      };
      res.status(400).json(body);
      return;
    }
    const result: SamplingImportResult = await importSamplingPoints(db, studyId, parsed.points);
    res.json(result);
  });

  return router;
}
