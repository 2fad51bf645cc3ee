import type { InterviewAnswers } from '../../questionnaire/answer';
import type { Block } from '../../questionnaire/block';
import type { PriceLadderAnswer } from '../../questionnaire/blocks/price-ladder-block';
import type { QualityFlag } from './quality-flag';
import { qualityThresholds } from './quality-thresholds';

/**
 * Flags each price ladder answered at `minSteps` or more prices with one and the same answer at
 * every price: all "yes", all "no", or one intent level. A ladder that stops at the first "no"
 * (yes, yes, yes, no) is not flagged: that is how an honest ladder ends.
 */
export function straightLiningFlags(
  blocks: readonly Block[],
  answers: InterviewAnswers,
  minSteps: number = qualityThresholds.minStraightLadderSteps,
): QualityFlag[] {
  const flags: QualityFlag[] = [];
  for (const block of blocks) {
    if (block.kind !== 'price-ladder') continue;
    const answer = answers[block.id] as PriceLadderAnswer | undefined;
    const steps = answer?.steps ?? [];
    if (steps.length < minSteps) continue;
    const response = steps[0].response;
    if (steps.every((step) => step.response === response)) {
      flags.push({ kind: 'straight-lining', blockId: block.id, steps: steps.length, response });
    }
  }
  return flags;
}
