import type { InterviewAnswers } from '@shared/questionnaire/answer';
import type { Block } from '@shared/questionnaire/block';
import { isBlockShown } from '@shared/questionnaire/block-visibility';

/**
 * Where the runner goes from step `from`: the next block that is asked given the answers so far,
 * or `blocks.length` — the closing screen — when none is left.
 */
export function nextStep(
  blocks: readonly Block[],
  answers: InterviewAnswers,
  from: number,
): number {
  for (let i = Math.max(from + 1, 0); i < blocks.length; i++) {
    if (isBlockShown(blocks[i], answers, blocks)) return i;
  }
  return blocks.length;
}

/** The block asked before step `from`, or null at the first one. */
export function previousStep(
  blocks: readonly Block[],
  answers: InterviewAnswers,
  from: number,
): number | null {
  for (let i = Math.min(from, blocks.length) - 1; i >= 0; i--) {
    if (isBlockShown(blocks[i], answers, blocks)) return i;
  }
  return null;
}

/**
 * The answers without those of blocks no longer asked: going back and changing an answer can
 * hide later blocks, whose old answers the server would refuse. Conditions only look at earlier
 * blocks, so one pass in order also drops answers hidden through a chain of conditions.
 */
export function withoutHiddenAnswers(
  blocks: readonly Block[],
  answers: InterviewAnswers,
): Record<string, unknown> {
  const kept: Record<string, unknown> = {};
  for (const block of blocks) {
    const answer = answers[block.id];
    if (answer !== undefined && isBlockShown(block, kept, blocks)) kept[block.id] = answer;
  }
  return kept;
}

/** The respondent declined at the consent block: the interview ends and keeps nothing. */
export function isRefusal(block: Block, answer: unknown): boolean {
  return block.kind === 'consent' && (answer as { agreed?: unknown } | undefined)?.agreed === false;
}

/** How far through the asked blocks step `step` is, for a progress bar (0–100). */
export function progressPercent(
  blocks: readonly Block[],
  answers: InterviewAnswers,
  step: number,
): number {
  const asked = blocks.filter((block) => isBlockShown(block, answers, blocks));
  if (asked.length === 0) return 100;
  const done = asked.filter((block) => blocks.indexOf(block) < step).length;
  return Math.round((100 * done) / asked.length);
}
