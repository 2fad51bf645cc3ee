import { Router } from 'express';
import { z } from 'zod';
import { fitRequestSchema } from '@shared/analysis/fit-spec';
import type { AppDependencies } from '../app-dependencies';
import { actorOf } from '../auth/actor';
import { validate } from '../http/validate';
import { findFit, insertFit, listFits } from './fits-repository';
import { fitSender } from './fit-sender';

const idSchema = z.uuid();

/** Fits of a study: ask for one (it runs on a worker), list them, poll one for its progress. */
export function fitsRouter(deps: AppDependencies): Router {
  const router = Router();
  const sender = fitSender(deps.config.DATABASE_URL);
  const base = '/studies/:studyId/fits';

  router.post(base, async (req, res) => {
    const { spec } = validate(fitRequestSchema, req.body);
    const fitId = await insertFit(deps.db, req.params.studyId, spec, actorOf(res).userId);
    await sender.send(fitId);
    res
      .status(202)
      .location(`/api${base.replace(':studyId', req.params.studyId)}/${fitId}`)
      .json({ fitId });
  });

  router.get(base, async (req, res) => {
    res.json(await listFits(deps.db, req.params.studyId));
  });

  router.get(`${base}/:fitId`, async (req, res) => {
    const fitId = validate(idSchema, req.params.fitId, 'fit id');
    res.json(await findFit(deps.db, req.params.studyId, fitId));
  });

  return router;
}
