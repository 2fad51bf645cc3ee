import { z } from 'zod';
import { storableText } from '../storable/storable-text';
import type { QuestionnaireDefinition } from './questionnaire-definition';

/** Body of `POST /api/studies/:studyId/questionnaires`; it starts as draft version 1. */
export const questionnaireCreateSchema = z.strictObject({
  title: storableText({ error: 'Give the questionnaire a title' })
    .trim()
    .min(1, 'Give the questionnaire a title')
    .max(200),
});
export type QuestionnaireCreate = z.infer<typeof questionnaireCreateSchema>;

/**
 * Body of a draft save. The definition is checked by `validateQuestionnaire`, which answers
 * with every problem at once rather than the first one zod meets.
 */
export const draftSaveSchema = z.strictObject({ definition: z.unknown() });

export type QuestionnaireVersionStatus = 'draft' | 'published';

/** One version without its content, as version lists show it. */
export interface QuestionnaireVersionSummary {
  id: string;
  version: number;
  status: QuestionnaireVersionStatus;
  createdAt: string;
  publishedAt: string | null;
  blockCount: number;
}

/** One version with its content. */
export interface QuestionnaireVersion extends QuestionnaireVersionSummary {
  questionnaireId: string;
  definition: QuestionnaireDefinition;
}

/** A questionnaire of a study with the versions the caller may see, newest first. */
export interface Questionnaire {
  id: string;
  studyId: string;
  title: string;
  createdAt: string;
  versions: QuestionnaireVersionSummary[];
}
