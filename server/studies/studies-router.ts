import { Router } from 'express';
import { z } from 'zod';
import { studyCreateSchema, studyUpdateSchema } from '@shared/studies/study';
import { studyMemberUpdateSchema } from '@shared/studies/study-member';
import { studyStatusChangeSchema } from '@shared/studies/study-status-change';
import type { AppDependencies } from '../app-dependencies';
import { actorOf } from '../auth/actor';
import { validate } from '../http/validate';
import { studyRolesHere } from './study-roles-here';
import {
  changeStudyStatus,
  createStudy,
  getStudy,
  listStudiesOf,
  updateStudy,
} from './studies-repository';
import {
  listStudyCandidates,
  listStudyMembers,
  removeStudyMember,
  setStudyMember,
} from './study-members-repository';

const studyParams = z.object({ studyId: z.uuid('The study id must be a UUID') });
const memberParams = studyParams.extend({ userId: z.uuid('The member id must be a UUID') });

/** Studies and who works on them; the access policy has already checked role and membership. */
export function studiesRouter({ db }: AppDependencies): Router {
  const router = Router();

  router.get('/studies', async (_req, res) => {
    res.json(await listStudiesOf(db, actorOf(res)));
  });

  router.post('/studies', async (req, res) => {
    const input = validate(studyCreateSchema, req.body);
    res.status(201).json(await createStudy(db, actorOf(res), input));
  });

  router.get('/studies/:studyId', async (req, res) => {
    const { studyId } = validate(studyParams, req.params, 'path');
    res.json(await getStudy(db, studyId, studyRolesHere(res)));
  });

  router.patch('/studies/:studyId', async (req, res) => {
    const { studyId } = validate(studyParams, req.params, 'path');
    const update = validate(studyUpdateSchema, req.body);
    res.json(await updateStudy(db, studyId, update, studyRolesHere(res)));
  });

  router.post('/studies/:studyId/status', async (req, res) => {
    const { studyId } = validate(studyParams, req.params, 'path');
    const { status } = validate(studyStatusChangeSchema, req.body);
    res.json(await changeStudyStatus(db, studyId, status, studyRolesHere(res)));
  });

  router.get('/studies/:studyId/members', async (req, res) => {
    const { studyId } = validate(studyParams, req.params, 'path');
    res.json(await listStudyMembers(db, studyId, actorOf(res).organisationId));
  });

  router.get('/studies/:studyId/member-candidates', async (req, res) => {
    const { studyId } = validate(studyParams, req.params, 'path');
    res.json(await listStudyCandidates(db, studyId, actorOf(res).organisationId));
  });

  router.put('/studies/:studyId/members/:userId', async (req, res) => {
    const { studyId, userId } = validate(memberParams, req.params, 'path');
    const { roles } = validate(studyMemberUpdateSchema, req.body);
    res.json(await setStudyMember(db, studyId, actorOf(res).organisationId, userId, roles));
  });

  router.delete('/studies/:studyId/members/:userId', async (req, res) => {
    const { studyId, userId } = validate(memberParams, req.params, 'path');
    await removeStudyMember(db, studyId, userId);
    res.status(204).end();
  });

  return router;
}
