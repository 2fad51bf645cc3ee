import { Router } from 'express';
import { z } from 'zod';
import { reviewActionSchema } from '@shared/field-sync/review-action';
import { bulkAcceptSchema, reviewQueueQuerySchema } from '@shared/field-sync/review-queue';
import type { AppDependencies } from '../app-dependencies';
import { actorOf } from '../auth/actor';
import { validate } from '../http/validate';
import { bulkAccept } from './bulk-accept';
import { interviewDetail } from './interview-detail-query';
import { pendingReviewCounts } from './pending-review-counts';
import { streamInterviewPhoto } from './photo-stream';
import { reviewFacets } from './review-facets-query';
import { reviewInterview } from './review-interview';
import { reviewQueue } from './review-queue-query';

const studyParams = z.object({ studyId: z.uuid('The study id must be a UUID') });
const interviewParams = studyParams.extend({
  interviewId: z.uuid('The interview id must be a UUID'),
});

const photoParams = interviewParams.extend({ photoId: z.uuid('The photo id must be a UUID') });

/** The supervisor's review of a study's interviews; the access policy says who may call. */
export function reviewRouter(deps: AppDependencies): Router {
  const { db, storage } = deps;
  const router = Router();

  router.get('/studies/:studyId/review', async (req, res) => {
    const { studyId } = validate(studyParams, req.params, 'path');
    const query = validate(reviewQueueQuerySchema, req.query, 'query');
    res.json(await reviewQueue(db, studyId, query));
  });

  router.get('/studies/:studyId/review/facets', async (req, res) => {
    const { studyId } = validate(studyParams, req.params, 'path');
    res.json(await reviewFacets(db, studyId));
  });

  router.post('/studies/:studyId/review/accept', async (req, res) => {
    const { studyId } = validate(studyParams, req.params, 'path');
    const body = validate(bulkAcceptSchema, req.body);
    res.json(await bulkAccept(db, studyId, body, actorOf(res)));
  });

  router.get('/review/pending', async (_req, res) => {
    res.json(await pendingReviewCounts(db, actorOf(res)));
  });

  router.get('/studies/:studyId/interviews/:interviewId', async (req, res) => {
    const { studyId, interviewId } = validate(interviewParams, req.params, 'path');
    res.setHeader('Cache-Control', 'no-store');
    res.json(await interviewDetail(db, studyId, interviewId));
  });

  router.get('/studies/:studyId/interviews/:interviewId/photos/:photoId', async (req, res) => {
    const where = validate(photoParams, req.params, 'path');
    await streamInterviewPhoto(db, storage, where, res);
  });

  router.post('/studies/:studyId/interviews/:interviewId/review', async (req, res) => {
    const { studyId, interviewId } = validate(interviewParams, req.params, 'path');
    const body = validate(reviewActionSchema, req.body);
    await reviewInterview(db, studyId, interviewId, body, actorOf(res));
    res.json(await interviewDetail(db, studyId, interviewId));
  });

  return router;
}
