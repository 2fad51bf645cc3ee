import { Router } from 'express';
import { and, eq } from 'drizzle-orm';
import { z } from 'zod';
import type { AppDependencies } from '../app-dependencies';
import { actorOf, type Actor } from '../auth/actor';
import { studyRolesOf } from '../auth/study-roles';
import type { Database } from '../db/database';
import { studies } from '../db/schema';
import { forbidden, notFound } from '../http/http-error';
import { validate } from '../http/validate';
import { listStudyDevices, signOutDevice } from './field-devices';

const studyParams = z.object({ studyId: z.uuid('The study id must be a UUID') });
const deviceParams = studyParams.extend({
  deviceId: z.uuid('The device id must be a UUID'),
});

/**
 * An admin may see every study's devices in the organisation; a supervisor those of the studies
 * they supervise (the access policy has already required one of the two roles).
 */
async function requireDeviceOversight(db: Database, actor: Actor, studyId: string) {
  if (actor.roles.includes('admin')) {
    const [study] = await db
      .select({ id: studies.id })
      .from(studies)
      .where(and(eq(studies.id, studyId), eq(studies.organisationId, actor.organisationId)));
    if (!study) throw notFound('That study');
    return;
  }
  const roles = await studyRolesOf(db, studyId, actor);
  if (!roles) throw notFound('That study');
  if (!roles.includes('supervisor'))
    throw forbidden('This is open to administrators and the study’s supervisors only.');
}

/** A study's field devices: what each last synced and still holds, and signing one out. */
export function devicesRouter({ db }: AppDependencies): Router {
  const router = Router();

  router.get('/studies/:studyId/devices', async (req, res) => {
    const { studyId } = validate(studyParams, req.params, 'path');
    const actor = actorOf(res);
    await requireDeviceOversight(db, actor, studyId);
    res.json(await listStudyDevices(db, studyId, actor.organisationId));
  });

  router.post('/studies/:studyId/devices/:deviceId/sign-out', async (req, res) => {
    const { studyId, deviceId } = validate(deviceParams, req.params, 'path');
    const actor = actorOf(res);
    await requireDeviceOversight(db, actor, studyId);
    res.json(await signOutDevice(db, studyId, actor.organisationId, deviceId, actor.userId));
  });

  return router;
}
