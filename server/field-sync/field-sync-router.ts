import express, { Router } from 'express';
import { syncBatchSchema } from '@shared/field-sync/sync-batch';
import type { AppDependencies } from '../app-dependencies';
import { actorOf } from '../auth/actor';
import { validate } from '../http/validate';
import { fieldAssignments } from './assignments-query';
import { fieldNotices } from './notices-query';
import { PublishedVersionCache } from './published-versions';
import { syncBatch } from './sync-batch';
import { recordDeviceSync } from './field-devices';

/**
 * Parses a sync batch before the API's 1 MB JSON parser sees it: 200 interviews with long
 * questionnaires can pass 1 MB. Mount it ahead of the API's own parser.
 */
export const syncBodyParser = express.json({ limit: '8mb' });

/** The enumerator device's endpoints: what to cache, the sync itself, and review notices. */
export function fieldSyncRouter(deps: AppDependencies): Router {
  const { db } = deps;
  const versions = new PublishedVersionCache();
  const router = Router();

  router.get('/field/assignments', async (_req, res) => {
    res.json(await fieldAssignments(db, actorOf(res)));
  });

  router.post('/field/sync', async (req, res) => {
    const { interviews, outboxCount } = validate(syncBatchSchema, req.body);
    const actor = actorOf(res);
    const result = await syncBatch(db, versions, actor, interviews);
    await recordDeviceSync(db, {
      sessionId: req.sessionID,
      userId: actor.userId,
      organisationId: actor.organisationId,
      userAgent: req.get('user-agent'),
      outboxCount,
      result,
    });
    res.json(result);
  });

  router.get('/field/notices', async (_req, res) => {
    res.json({ notices: await fieldNotices(db, actorOf(res).userId) });
  });

  return router;
}
