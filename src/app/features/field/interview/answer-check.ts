import type { AmountWords } from '@shared/money/amount-words';
import { answerSchemaFor } from '@shared/questionnaire/answer-schema';
import type { Block } from '@shared/questionnaire/block';
import { wtpOpenAmountName } from '@shared/questionnaire/blocks/wtp-open-block';
import { answerSchemaInCurrency } from './answer-schema-in-currency';

/** One thing wrong with an answer: where inside it (empty for the whole) and what to do. */
export interface AnswerIssue {
  readonly path: string;
  readonly message: string;
}

/**
 * What stops the runner from moving on: the block's own answer schema (the one the server
 * checks too, its amounts written with `words`), or a missing answer where one is required.
 * An optional block left empty is fine. Each message names its field.
 */
export function answerIssues(block: Block, answer: unknown, words?: AmountWords): AnswerIssue[] {
  if (answer === undefined || answer === null) {
    return block.required ? [{ path: '', message: missingAnswer(block) }] : [];
  }
  const schema = words ? answerSchemaInCurrency(block, words) : answerSchemaFor(block);
  const parsed = schema.safeParse(answer);
  if (parsed.success) return [];
  return parsed.error.issues.map((issue) => ({
    path: issue.path.map(String).join('.'),
    message: issue.message,
  }));
}

/**
 * The issues to show on a screen where some typed amounts cannot be read (`typing`, by answer
 * part): those amounts' own messages, in place of the schema's word that they are missing.
 */
export function screenIssues(
  issues: readonly AnswerIssue[],
  typing: ReadonlyMap<string, string>,
): AnswerIssue[] {
  if (typing.size === 0) return [...issues];
  const typed = [...typing].map(([path, message]) => ({ path, message }));
  return typed.concat(issues.filter((issue) => issue.path !== '' && !typing.has(issue.path)));
}

/** What to do when a required block has no answer at all, in the words of its screen. */
function missingAnswer(block: Block): string {
  switch (block.kind) {
    case 'location':
      return 'Find the position, then keep it';
    case 'photo':
      return 'Take at least one photo';
    case 'wtp-open':
      return `${wtpOpenAmountName}: type the amount`;
    default:
      return 'This question needs an answer';
  }
}
