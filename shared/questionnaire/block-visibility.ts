import type { InterviewAnswers } from './answer';
import type { Block } from './block';
import type { SkipCondition } from './skip-condition';
import { skipSubjectOf } from './skip-targets';

/**
 * Whether `block` is asked, given the answers so far and the questionnaire's blocks. A block
 * whose condition looks at an unanswered block is not asked — which also hides the blocks
 * that depend on a block that was itself skipped.
 */
export function isBlockShown(
  block: Block,
  answers: InterviewAnswers,
  blocks: readonly Block[],
): boolean {
  const condition = block.showIf;
  if (!condition) return true;
  const target = blocks.find((b) => b.id === condition.blockId);
  return conditionHolds(condition, target, answers[condition.blockId]);
}

/**
 * Whether a skip condition holds for `answer`, the answer to its `target` block (undefined when
 * that block was not answered, or the questionnaire has no such block). A caller checking many
 * interviews finds the target once; `isBlockShown` finds it on every call.
 */
export function conditionHolds(
  condition: SkipCondition,
  target: Block | undefined,
  answer: unknown,
): boolean {
  if (!target || answer === undefined) return false;
  if (condition.test === 'answered') return true;
  const subject = skipSubjectOf(target, answer);
  if (subject === undefined || subject === null) return false;
  switch (condition.test) {
    case 'equals':
      return Array.isArray(subject)
        ? subject.includes(String(condition.value))
        : subject === condition.value;
    case 'not-equals':
      return Array.isArray(subject)
        ? !subject.includes(String(condition.value))
        : subject !== condition.value;
    case 'less':
      return typeof subject === 'number' && subject < condition.value;
    case 'greater':
      return typeof subject === 'number' && subject > condition.value;
  }
}
