import { Router } from 'express';
import type { AppDependencies } from '../app-dependencies';
import { tokensRouter } from '../portal/tokens-router';
import { readApiRouter } from '../read-api/read-api-router';
import { schedulesRouter } from '../schedules/schedules-router';
import { fitsRouter } from './fits-router';

/** The routers of analysis, publishing, the client's portal and the read API, as one. */
export function analysisRouters(deps: AppDependencies): Router {
  const router = Router();
  router.use(fitsRouter(deps));
  router.use(schedulesRouter(deps));
  router.use(tokensRouter(deps));
  router.use(readApiRouter(deps));
  return router;
}
