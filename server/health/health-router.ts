import { Router } from 'express';
import type { HealthStatus } from '@shared/health/health-status';
import type { AppDependencies } from '../app-dependencies';
import { CachedReport } from './cached-report';
import { checkDependencies } from './dependency-checks';

/**
 * `GET /api/health` answers anyone with `ok` or `degraded` only; `GET /api/health/details`
 * gives admins each dependency's probe. Both read the same probe, run at most every 15 s.
 */
export function healthRouter(deps: AppDependencies): Router {
  const router = Router();
  const report = new CachedReport(() => checkDependencies(deps));
  router.get('/health', async (_req, res) => {
    const { status } = await report.current();
    const body: HealthStatus = { status };
    res.status(status === 'ok' ? 200 : 503).json(body);
  });
  router.get('/health/details', async (_req, res) => {
    const body = await report.current();
    res.status(body.status === 'ok' ? 200 : 503).json(body);
  });
  return router;
}
