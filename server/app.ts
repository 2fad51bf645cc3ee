import compression from 'compression';
import express from 'express';
import type { AppDependencies } from './app-dependencies';
import { accessGuard } from './auth/access-guard';
import { authRouter, sessionRouter } from './auth/auth-router';
import { requireCsrfToken } from './auth/csrf';
import { loadActor } from './auth/load-actor';
import './auth/session-data';
import { healthRouter } from './health/health-router';
import { apiNotFound, errorHandler } from './http/error-handler';
import { noStore } from './http/no-store';
import { requestLogger } from './http/request-logger';
import { securityHeaders } from './http/security-headers';
import { sessionMiddleware } from './http/session-middleware';
import { staticApp } from './http/static-app';
import { membersRouter } from './members/members-router';
import { fieldRoutesRouter } from './field-routes/field-routes-router';
import { samplingRouter } from './sampling/sampling-router';
import { questionnairesRouter } from './questionnaires/questionnaires-router';
import { studiesRouter } from './studies/studies-router';
import { fieldSyncRouters, syncBodyParser } from './field-sync/field-sync-routers';
import { analysisRouters } from './fits/analysis-routers';
import { rateLimits } from './http/rate-limits';
import { syncGate } from './field-sync/sync-gate';
import { datasetsRouter } from './datasets/datasets-router';
import { rawDataRouter } from './raw-data/raw-data-router';

/** Builds the whole app without listening, so tests drive it through supertest. */
export function createApp(deps: AppDependencies) {
  const app = express();
  app.disable('x-powered-by');
  // Gzip for every compressible answer: the app's scripts reach a phone on a weak signal in
  // under a third of the bytes (measured on the start-up chunks), and a fit's results with
  // their resampled curves shrink as much.
  app.use(compression());
  app.use(securityHeaders(deps.config));
  app.use(sessionMiddleware(deps.config, deps.db));
  const limits = rateLimits(deps.config, deps.db);
  app.use(['/auth/sign-in', '/auth/callback', '/auth/invitation'], limits.signIn);

  app.use('/auth', express.urlencoded({ extended: false, limit: '4kb' }), authRouter(deps));

  const api = express.Router();
  api.use(requestLogger);
  api.use(noStore);
  // A sync batch may pass 1 MB; its own parser runs first (the next one skips a parsed body).
  api.use('/field/sync', syncGate(deps.config), syncBodyParser);
  api.use(express.json({ limit: '1mb' }));
  api.use(loadActor(deps.db));
  api.use(limits.tokenGuesses);
  api.use(accessGuard(deps.db));
  api.use(limits.writes);
  api.use(requireCsrfToken);
  api.use(healthRouter(deps));
  api.use(sessionRouter(deps));
  api.use(membersRouter(deps));
  api.use(studiesRouter(deps));
  api.use(questionnairesRouter(deps));
  api.use(samplingRouter(deps));
  api.use(fieldRoutesRouter(deps));
  api.use(fieldSyncRouters(deps));
  api.use(analysisRouters(deps));
  api.use(datasetsRouter(deps));
  api.use(rawDataRouter(deps));
  api.use(apiNotFound);
  app.use('/api', api);

  if (deps.config.STATIC_DIR) app.use(staticApp(deps.config.STATIC_DIR));
  app.use(errorHandler);
  return app;
}
