import { and, eq } from 'drizzle-orm';
import { alias } from 'drizzle-orm/pg-core';
import type { InterviewDetail } from '@shared/field-sync/interview-detail';
import type { QuestionnaireDefinition } from '@shared/questionnaire/questionnaire-definition';
import type { Executor } from '../db/database';
import {
  interviews,
  questionnaireVersions,
  questionnaires,
  routes,
  samplingPoints,
  users,
} from '../db/schema';
import { notFound } from '../http/http-error';
import { interviewPhotoLinks } from './photo-links';
import { reviewJoins, reviewQueueColumns, toQueueItem } from './review-columns';

const reviewer = alias(users, 'reviewer');

/** One interview of the study for review, or 404 when the study has no such interview. */
export async function interviewDetail(
  db: Executor,
  studyId: string,
  interviewId: string,
): Promise<InterviewDetail> {
  const [row] = await db
    .select({
      ...reviewQueueColumns,
      version: questionnaireVersions.version,
      definition: questionnaireVersions.definition,
      title: questionnaires.title,
      reviewerName: reviewer.name,
    })
    .from(interviews)
    .innerJoin(
      questionnaireVersions,
      eq(questionnaireVersions.id, interviews.questionnaireVersionId),
    )
    .innerJoin(questionnaires, eq(questionnaires.id, questionnaireVersions.questionnaireId))
    .leftJoin(users, reviewJoins.enumerator)
    .leftJoin(routes, reviewJoins.route)
    .leftJoin(samplingPoints, reviewJoins.point)
    .leftJoin(reviewer, eq(reviewer.id, interviews.reviewedBy))
    .where(and(eq(interviews.studyId, studyId), eq(interviews.id, interviewId)));
  if (!row) throw notFound('That interview');
  const { interview } = row;
  return {
    ...toQueueItem(row),
    questionnaireVersionId: interview.questionnaireVersionId,
    questionnaireTitle: row.title,
    questionnaireVersion: row.version,
    definition: row.definition as QuestionnaireDefinition,
    answers: interview.answers as Record<string, unknown>,
    gps:
      interview.latitude !== null && interview.longitude !== null
        ? {
            latitude: interview.latitude,
            longitude: interview.longitude,
            accuracyM: interview.gpsAccuracyM ?? 0,
          }
        : null,
    pointPosition:
      row.pointLatitude !== null && row.pointLongitude !== null
        ? { latitude: row.pointLatitude, longitude: row.pointLongitude }
        : null,
    photos: await interviewPhotoLinks(db, studyId, interview.id),
    reviewNote: interview.reviewNote,
    reviewerName: row.reviewerName,
  };
}
