import type { z } from 'zod';
import type { InterviewAnswers } from './answer';
import { answerSchemaFor } from './answer-schema';
import type { Block } from './block';
import { isBlockShown } from './block-visibility';
import type { QuestionnaireDefinition } from './questionnaire-definition';
import type { QuestionnaireProblem } from './questionnaire-problem';

/**
 * Every problem with one interview's answers against the questionnaire version it was taken
 * with: answers to blocks that do not exist or were not to be asked, required blocks left
 * unanswered, answers that do not fit their block — and, without consent, any answer at all.
 * `answers` is keyed by block id; an empty list means the interview can be stored.
 *
 * `schemaFor` gives each block's answer schema; a caller checking many interviews of one frozen
 * version passes schemas built once (building one costs far more than using it).
 */
export function validateInterviewAnswers(
  definition: QuestionnaireDefinition,
  answers: InterviewAnswers,
  schemaFor: (block: Block) => z.ZodType = answerSchemaFor,
): QuestionnaireProblem[] {
  const { blocks } = definition;
  const problems: QuestionnaireProblem[] = [];
  for (const id of Object.keys(answers)) {
    if (!blocks.some((b) => b.id === id)) {
      problems.push({
        blockIndex: null,
        blockId: id,
        path: '',
        message: `No block has the id "${id}"`,
      });
    }
  }
  const consent = blocks[0];
  const agreed = (answers[consent?.id ?? ''] as { agreed?: unknown } | undefined)?.agreed === true;
  blocks.forEach((block, blockIndex) => {
    const answer = answers[block.id];
    const at = (path: string, message: string) =>
      problems.push({ blockIndex, blockId: block.id, path, message });
    if (block.kind !== 'consent' && !agreed) {
      if (answer !== undefined) at('', 'Without consent, no answer may be kept');
      return;
    }
    const shown = isBlockShown(block, answers, blocks);
    if (!shown) {
      if (answer !== undefined) at('', 'This block was not to be asked, given the earlier answers');
      return;
    }
    if (answer === undefined) {
      if (block.required) at('', 'This block needs an answer');
      return;
    }
    const parsed = schemaFor(block).safeParse(answer);
    if (!parsed.success) {
      for (const issue of parsed.error.issues) at(issue.path.map(String).join('.'), issue.message);
    }
  });
  return problems;
}
