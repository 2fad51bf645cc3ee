import { Router } from 'express';
import type { AppDependencies } from '../app-dependencies';
import { fieldPhotosRouter } from './field-photos-router';
import { fieldSyncRouter } from './field-sync-router';
import { reviewRouter } from './review-router';
import { devicesRouter } from './devices-router';

export { syncBodyParser } from './field-sync-router';

/** Field sync (device endpoints, photo uploads) and the supervisor's review, as one router. */
export function fieldSyncRouters(deps: AppDependencies): Router {
  const router = Router();
  router.use(fieldSyncRouter(deps));
  router.use(fieldPhotosRouter(deps));
  router.use(reviewRouter(deps));
  router.use(devicesRouter(deps));
  return router;
}
