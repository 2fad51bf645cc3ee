import { Router, type Response } from 'express';
import { z } from 'zod';
import { publishingProblems } from '@shared/questionnaire/publishing-problems';
import {
  draftSaveSchema,
  questionnaireCreateSchema,
} from '@shared/questionnaire/questionnaire-resource';
import { validateQuestionnaire } from '@shared/questionnaire/validate-questionnaire';
import type { AppDependencies } from '../app-dependencies';
import { actorOf } from '../auth/actor';
import { validate } from '../http/validate';
import { studyRolesHere } from '../studies/study-roles-here';
import {
  createQuestionnaire,
  getQuestionnaire,
  getVersion,
  listQuestionnaires,
} from './questionnaires-repository';
import { publishVersion, saveDraft, startNewDraft } from './version-changes';

const studyParams = z.object({ studyId: z.uuid('The study id must be a UUID') });
const questionnaireParams = studyParams.extend({
  questionnaireId: z.uuid('The questionnaire id must be a UUID'),
});
const versionParams = questionnaireParams.extend({
  version: z.coerce.number().int('A version is a whole number').positive('Versions start at 1'),
});

/** Only researchers see drafts; the others read what has been published. */
const seesDrafts = (res: Response) => studyRolesHere(res).includes('researcher');

/** Questionnaires and their versions; a published version never changes. */
export function questionnairesRouter({ db }: AppDependencies): Router {
  const router = Router();
  const base = '/studies/:studyId/questionnaires';

  router.get(base, async (req, res) => {
    const { studyId } = validate(studyParams, req.params, 'path');
    res.json(await listQuestionnaires(db, studyId, seesDrafts(res)));
  });

  router.post(base, async (req, res) => {
    const { studyId } = validate(studyParams, req.params, 'path');
    const { title } = validate(questionnaireCreateSchema, req.body);
    res.status(201).json(await createQuestionnaire(db, studyId, title));
  });

  router.get(`${base}/:questionnaireId`, async (req, res) => {
    const { studyId, questionnaireId } = validate(questionnaireParams, req.params, 'path');
    res.json(await getQuestionnaire(db, studyId, questionnaireId, seesDrafts(res)));
  });

  router.put(`${base}/:questionnaireId/draft`, async (req, res) => {
    const { studyId, questionnaireId } = validate(questionnaireParams, req.params, 'path');
    const { definition } = validate(draftSaveSchema, req.body);
    res.json(
      await saveDraft(db, studyId, questionnaireId, 'current', definition, validateQuestionnaire),
    );
  });

  router.post(`${base}/:questionnaireId/new-draft`, async (req, res) => {
    const { studyId, questionnaireId } = validate(questionnaireParams, req.params, 'path');
    res.status(201).json(await startNewDraft(db, studyId, questionnaireId));
  });

  router.get(`${base}/:questionnaireId/versions/:version`, async (req, res) => {
    const { studyId, questionnaireId, version } = validate(versionParams, req.params, 'path');
    res.json(await getVersion(db, studyId, questionnaireId, version, seesDrafts(res)));
  });

  router.put(`${base}/:questionnaireId/versions/:version`, async (req, res) => {
    const { studyId, questionnaireId, version } = validate(versionParams, req.params, 'path');
    const { definition } = validate(draftSaveSchema, req.body);
    res.json(
      await saveDraft(db, studyId, questionnaireId, version, definition, validateQuestionnaire),
    );
  });

  router.post(`${base}/:questionnaireId/versions/:version/publish`, async (req, res) => {
    const { studyId, questionnaireId, version } = validate(versionParams, req.params, 'path');
    const userId = actorOf(res).userId;
    res.json(
      await publishVersion(db, studyId, questionnaireId, version, userId, publishingProblems),
    );
  });

  return router;
}
