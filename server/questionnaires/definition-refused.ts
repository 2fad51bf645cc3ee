import type { FieldIssue } from '@shared/http/api-error';
import type { QuestionnaireProblem } from '@shared/questionnaire/questionnaire-problem';
import { HttpError } from '../http/http-error';

/** A 400 listing every problem, each with its path inside the request body. */
export function definitionRefused(
  problems: QuestionnaireProblem[],
  prefix: string,
  verb = 'is not valid',
): HttpError {
  const issues: FieldIssue[] = problems.map((p) => ({
    path: [prefix, ...(p.blockIndex === null ? [] : ['blocks', String(p.blockIndex)]), p.path]
      .filter(Boolean)
      .join('.'),
    message: p.message,
  }));
  const count = problems.length === 1 ? 'one problem' : `${problems.length} problems`;
  return new HttpError(
    400,
    'invalid-questionnaire',
    `The questionnaire ${verb}: ${count} to fix.`,
    issues,
  );
}
