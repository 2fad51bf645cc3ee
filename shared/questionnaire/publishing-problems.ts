import type { QuestionnaireProblem } from './questionnaire-problem';
import { validateQuestionnaire } from './validate-questionnaire';

/**
 * What stops a draft from being published: every problem `validateQuestionnaire` finds, and a
 * questionnaire with nothing to ask after consent.
 */
export function publishingProblems(definition: unknown): QuestionnaireProblem[] {
  const problems = validateQuestionnaire(definition);
  const blocks = (definition as { blocks?: unknown } | null)?.blocks;
  if (Array.isArray(blocks) && blocks.length < 2) {
    problems.push({
      blockIndex: null,
      blockId: null,
      path: 'blocks',
      message: 'Add at least one question after consent before publishing',
    });
  }
  return problems;
}
