import type { InterviewAnswers } from '../../questionnaire/answer';
import type { Block } from '../../questionnaire/block';
import type {
  PriceThresholdsAnswer,
  ThresholdField,
} from '../../questionnaire/blocks/price-thresholds-block';
import type { QualityFlag } from './quality-flag';

/** The order the four thresholds must keep, lowest first (Van Westendorp). */
const ordered: readonly ThresholdField[] = [
  'tooCheapMinor',
  'cheapMinor',
  'expensiveMinor',
  'tooExpensiveMinor',
];

/**
 * Flags each price-thresholds answer that breaks too cheap ≤ cheap ≤ expensive ≤ too expensive,
 * listing every pair (of all six) in the wrong order, so "cheap above too expensive" shows too.
 */
export function thresholdOrderFlags(
  blocks: readonly Block[],
  answers: InterviewAnswers,
): QualityFlag[] {
  const flags: QualityFlag[] = [];
  for (const block of blocks) {
    if (block.kind !== 'price-thresholds') continue;
    const answer = answers[block.id] as PriceThresholdsAnswer | undefined;
    if (!answer) continue;
    const violations: { lower: ThresholdField; higher: ThresholdField }[] = [];
    for (let i = 0; i < ordered.length; i++) {
      for (let j = i + 1; j < ordered.length; j++) {
        const lower = ordered[i];
        const higher = ordered[j];
        if (answer[lower] > answer[higher]) violations.push({ lower, higher });
      }
    }
    if (violations.length > 0) {
      flags.push({ kind: 'thresholds-out-of-order', blockId: block.id, violations });
    }
  }
  return flags;
}
