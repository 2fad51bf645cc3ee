import { z } from 'zod';
import { questionnaireDefinitionSchema } from '../questionnaire/questionnaire-definition';
import { fieldRouteSchema } from '../routes/field-route';
import { studyStatuses } from '../studies/study-status';

/** What the device needs of a study to run interviews offline. */
export const fieldStudySchema = z.object({
  id: z.uuid(),
  name: z.string(),
  productName: z.string(),
  secondProductName: z.string().nullable(),
  currency: z.string(),
  locale: z.string(),
  market: z.string(),
  priceMinMinor: z.number().int(),
  priceMaxMinor: z.number().int(),
  status: z.enum(studyStatuses),
});
export type FieldStudy = z.infer<typeof fieldStudySchema>;

/**
 * A published (hence frozen) questionnaire version with its whole definition — blocks, skip
 * conditions and bid designs — so interviews run with no network.
 */
export const fieldQuestionnaireVersionSchema = z.object({
  id: z.uuid(),
  questionnaireId: z.uuid(),
  studyId: z.uuid(),
  title: z.string(),
  version: z.number().int(),
  publishedAt: z.string(),
  definition: questionnaireDefinitionSchema,
});
export type FieldQuestionnaireVersion = z.infer<typeof fieldQuestionnaireVersionSchema>;

/**
 * `GET /api/field/assignments`: the routes assigned to the signed-in enumerator (stops with
 * their points' positions and quotas), the studies they belong to, and every published
 * questionnaire version of those studies. The device caches all of it.
 */
export const fieldAssignmentsSchema = z.object({
  enumerator: z.object({ userId: z.uuid(), name: z.string() }),
  studies: z.array(fieldStudySchema),
  routes: z.array(fieldRouteSchema),
  questionnaireVersions: z.array(fieldQuestionnaireVersionSchema),
  generatedAt: z.string(),
});
export type FieldAssignments = z.infer<typeof fieldAssignmentsSchema>;
