import { Router } from 'express';
import { z } from 'zod';
import { fieldRouteInputSchema, routeAssignmentSchema } from '@shared/routes/field-route-input';
import type { AppDependencies } from '../app-dependencies';
import { actorOf } from '../auth/actor';
import { validate } from '../http/validate';
import { deleteRoute } from './field-routes-store';
import { getFieldRoute, listFieldRoutes } from './field-routes-query';
import { assignRoute } from './route-assignment';
import { routeVisibilityOf } from './route-visibility';
import { saveRoute } from './save-route';
import { studyProgress } from './study-progress';
import { listStudyEnumerators } from './study-enumerators';

const studyParams = z.object({ studyId: z.uuid('The study id must be a UUID') });
const routeParams = studyParams.extend({ routeId: z.uuid('The route id must be a UUID') });

/** Field routes of a study, their assignment and progress; the access policy says who may call. */
export function fieldRoutesRouter(deps: AppDependencies): Router {
  const { db } = deps;
  const router = Router();

  router.get('/studies/:studyId/routes', async (req, res) => {
    const { studyId } = validate(studyParams, req.params, 'path');
    res.json(await listFieldRoutes(db, studyId, routeVisibilityOf(res)));
  });

  router.post('/studies/:studyId/routes', async (req, res) => {
    const { studyId } = validate(studyParams, req.params, 'path');
    const input = validate(fieldRouteInputSchema, req.body);
    res.status(201).json(await saveRoute(deps, { studyId, input, actor: actorOf(res) }));
  });

  router.get('/studies/:studyId/routes/:routeId', async (req, res) => {
    const { studyId, routeId } = validate(routeParams, req.params, 'path');
    res.json(await getFieldRoute(db, studyId, routeId, routeVisibilityOf(res)));
  });

  router.put('/studies/:studyId/routes/:routeId', async (req, res) => {
    const { studyId, routeId } = validate(routeParams, req.params, 'path');
    const input = validate(fieldRouteInputSchema, req.body);
    res.json(await saveRoute(deps, { studyId, routeId, input, actor: actorOf(res) }));
  });

  router.delete('/studies/:studyId/routes/:routeId', async (req, res) => {
    const { studyId, routeId } = validate(routeParams, req.params, 'path');
    await db.transaction((tx) => deleteRoute(tx, studyId, routeId));
    res.status(204).end();
  });

  router.put('/studies/:studyId/routes/:routeId/assignment', async (req, res) => {
    const { studyId, routeId } = validate(routeParams, req.params, 'path');
    const { enumeratorId } = validate(routeAssignmentSchema, req.body);
    const route = await db.transaction(async (tx) => {
      const request = { studyId, routeId, enumeratorId, assignedBy: actorOf(res), resend: true };
      await assignRoute(tx, deps, request);
      return getFieldRoute(tx, studyId, routeId, {});
    });
    res.json(route);
  });

  router.get('/studies/:studyId/enumerators', async (req, res) => {
    const { studyId } = validate(studyParams, req.params, 'path');
    res.json(await listStudyEnumerators(db, studyId));
  });

  router.get('/studies/:studyId/progress', async (req, res) => {
    const { studyId } = validate(studyParams, req.params, 'path');
    res.json(await studyProgress(db, studyId, routeVisibilityOf(res)));
  });

  return router;
}
