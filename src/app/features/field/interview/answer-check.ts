import { answerSchemaFor } from '@shared/questionnaire/answer-schema';
import type { Block } from '@shared/questionnaire/block';

/** One thing wrong with an answer: where inside it (empty for the whole) and what to do. */
export interface AnswerIssue {
  readonly path: string;
  readonly message: string;
}

/**
 * What stops the runner from moving on: the block's own answer schema (the one the server
 * checks too), or a missing answer where one is required. An optional block left empty is fine.
 */
export function answerIssues(block: Block, answer: unknown): AnswerIssue[] {
  if (answer === undefined || answer === null) {
    return block.required ? [{ path: '', message: 'This question needs an answer' }] : [];
  }
  const parsed = answerSchemaFor(block).safeParse(answer);
  if (parsed.success) return [];
  return parsed.error.issues.map((issue) => ({
    path: issue.path.map(String).join('.'),
    message: issue.message,
  }));
}
