import type { z } from 'zod';
import type { InterviewAnswers } from './answer';
import { answerFitsFor } from './answer-fits';
import { answerSchemaFor } from './answer-schema';
import type { Block } from './block';
import { conditionHolds } from './block-visibility';
import { validateInterviewAnswers } from './interview-answers';
import type { QuestionnaireDefinition } from './questionnaire-definition';
import type { QuestionnaireProblem } from './questionnaire-problem';
import type { SkipCondition } from './skip-condition';

/** Checks the answers of interviews taken with one frozen questionnaire version. */
export interface AnswersCheck {
  /** Every problem with one interview's answers, exactly as `validateInterviewAnswers` words them. */
  readonly problems: (answers: InterviewAnswers) => QuestionnaireProblem[];
  /** The quick pass alone: true means no problem at all; false means ask `problems`. */
  readonly passes: (answers: InterviewAnswers) => boolean;
}

/** What checking one block needs, found once for the version. */
interface PreparedBlock {
  id: string;
  required: boolean;
  schema: z.ZodType;
  fits: (answer: unknown) => boolean;
  condition: SkipCondition | undefined;
  /** The block the condition looks at, as `isBlockShown` would find it. */
  target: Block | undefined;
}

/**
 * Prepares, once for a version that no longer changes, everything checking an interview's
 * answers needs: the block ids, each block's schema and quick test, each condition's target.
 * Most interviews are valid, and a valid one then passes in one loop of plain tests. Anything
 * that does not pass quickly goes through `validateInterviewAnswers` itself, so the problems
 * reported are word for word the same. Pure: the device may use it as the server does.
 */
export function prepareAnswersCheck(definition: QuestionnaireDefinition): AnswersCheck {
  const { blocks } = definition;
  const schemas = new Map(blocks.map((block) => [block, answerSchemaFor(block)]));
  const schemaFor = (block: Block) => schemas.get(block) ?? answerSchemaFor(block);
  const ids = new Set(blocks.map((block) => block.id));
  const consentId = blocks[0]?.id ?? '';
  const prepared: PreparedBlock[] = blocks.map((block) => ({
    id: block.id,
    required: block.required,
    schema: schemaFor(block),
    fits: answerFitsFor(block),
    condition: block.showIf,
    target: block.showIf && blocks.find((b) => b.id === block.showIf?.blockId),
  }));

  const passes = (answers: InterviewAnswers): boolean => {
    // Without consent every other answer is a problem: leave that case to the full check.
    if ((answers[consentId] as { agreed?: unknown } | undefined)?.agreed !== true) return false;
    for (const id of Object.keys(answers)) if (!ids.has(id)) return false;
    for (const block of prepared) {
      const answer = answers[block.id];
      const { condition } = block;
      if (condition && !conditionHolds(condition, block.target, answers[condition.blockId])) {
        if (answer !== undefined) return false;
        continue;
      }
      if (answer === undefined) {
        if (block.required) return false;
        continue;
      }
      if (!block.fits(answer) && !block.schema.safeParse(answer).success) return false;
    }
    return true;
  };

  return {
    passes,
    problems: (answers) =>
      passes(answers) ? [] : validateInterviewAnswers(definition, answers, schemaFor),
  };
}
