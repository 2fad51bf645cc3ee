import { fieldInterviewSchema, type FieldInterview } from '@shared/field-sync/field-interview';
import { fitsFieldInterview } from '@shared/field-sync/field-interview-fits';
import { photoManifestProblems } from '@shared/field-sync/photo-references';
import type { LatLng } from '@shared/field-sync/quality/great-circle-distance';
import type { EnumeratorScope } from './enumerator-scope';
import type { PublishedVersion } from './published-versions';
import { rejection, type Rejection } from './sync-rejection';

/** An interview that passed every check of its own, with what later steps need. */
export interface CheckedInterview {
  interview: FieldInterview;
  version: PublishedVersion;
  point: LatLng;
}

export interface CheckContext {
  scope: EnumeratorScope;
  versions: ReadonlyMap<string, PublishedVersion>;
}

/** The raw item's `id` when it is a string, so even a refused item can be matched up. */
export function rawIdOf(raw: unknown): string | null {
  const id = (raw as { id?: unknown } | null)?.id;
  return typeof id === 'string' ? id : null;
}

/**
 * Checks one interview of a batch on its own, in order: the record's shape; the questionnaire
 * version (published, of this study); the route (assigned to the caller, of this study) and
 * the point (on that route); consent; every answer against its block; the photo list against
 * the answers. The first failing step refuses the item with all of its issues.
 */
export function checkInterview(raw: unknown, context: CheckContext): CheckedInterview | Rejection {
  // The quick test passes the usual interview without building zod's result; whatever it does
  // not pass, the schema judges (and words the refusal).
  const parsed = fitsFieldInterview(raw)
    ? { success: true as const, data: raw }
    : fieldInterviewSchema.safeParse(raw);
  if (!parsed.success) {
    const issues = parsed.error.issues.map((issue) => ({
      path: issue.path.map(String).join('.') || 'interview',
      message: issue.message,
    }));
    return rejection('invalid-interview', issues);
  }
  const interview = parsed.data;
  const version = context.versions.get(interview.questionnaireVersionId);
  if (!version || version.studyId !== interview.studyId) {
    return rejection('unknown-version', [
      {
        path: 'questionnaireVersionId',
        message: 'No published version of this study’s questionnaires has this id',
      },
    ]);
  }
  const placeProblem = checkPlace(interview, context.scope);
  if (!('latitude' in placeProblem)) return placeProblem;
  const answerProblem = checkAnswers(interview, version);
  if (answerProblem) return answerProblem;
  return { interview, version, point: placeProblem };
}

function checkPlace(interview: FieldInterview, scope: EnumeratorScope): LatLng | Rejection {
  const route = scope.get(interview.routeId);
  if (!route) {
    return rejection('not-assigned', [
      { path: 'routeId', message: 'This route is not assigned to you' },
    ]);
  }
  if (route.studyId !== interview.studyId) {
    return rejection('not-assigned', [
      { path: 'routeId', message: 'This route belongs to another study' },
    ]);
  }
  const point = route.points.get(interview.pointId);
  if (!point) {
    return rejection('not-assigned', [
      { path: 'pointId', message: 'This point is not a stop of the route' },
    ]);
  }
  return point;
}

function checkAnswers(interview: FieldInterview, version: PublishedVersion): Rejection | null {
  const { blocks } = version.definition;
  const consent = blocks[0];
  const consentAnswer = interview.answers[consent?.id ?? ''] as { agreed?: unknown } | undefined;
  if (consent?.kind === 'consent' && consentAnswer?.agreed !== true) {
    const message =
      consentAnswer === undefined
        ? 'Consent was not recorded; record it before any other answer'
        : 'The respondent declined; a refusal is not kept as an interview';
    return rejection('no-consent', [{ path: `answers.${consent.id}`, message }]);
  }
  const problems = version.answersCheck.problems(interview.answers);
  if (problems.length > 0) {
    const issues = problems.map((problem) => ({
      path: ['answers', problem.blockId, problem.path].filter(Boolean).join('.'),
      message: problem.message,
    }));
    return rejection('invalid-answers', issues);
  }
  const photoProblems = photoManifestProblems(blocks, interview.answers, interview.photos);
  return photoProblems.length > 0 ? rejection('photo-manifest', photoProblems) : null;
}
