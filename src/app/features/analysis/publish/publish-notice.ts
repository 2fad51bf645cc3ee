import type { ApiProblem } from '../../../core/api-problem';
import type { FieldIssue } from '@shared/http/api-error';

/** "Version 2 published; 1 client told by e-mail." in plain plurals. */
export function publishedNotice(version: number, clientsNotified: number | undefined): string {
  const told =
    clientsNotified === undefined
      ? 'the study’s clients are told by e-mail'
      : clientsNotified === 0
        ? 'the study has no client to tell'
        : `${clientsNotified} ${clientsNotified === 1 ? 'client' : 'clients'} told by e-mail`;
  return `Version ${version} published; ${told}.`;
}

/**
 * The issues worth listing under a refusal: those its message does not already say (a form
 * error's message is its field's message, which would otherwise show twice).
 */
export function issuesBeyondMessage(problem: ApiProblem): readonly FieldIssue[] {
  const message = problem.message.toLowerCase();
  return problem.issues.filter((issue) => !message.includes(issue.message.toLowerCase()));
}
