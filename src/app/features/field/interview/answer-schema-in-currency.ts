import type { z } from 'zod';
import type { AmountWords } from '@shared/money/amount-words';
import { answerSchemaFor } from '@shared/questionnaire/answer-schema';
import type { Block } from '@shared/questionnaire/block';
import { priceLadderAnswerSchema } from '@shared/questionnaire/blocks/price-ladder-block';
import { priceThresholdsAnswerSchema } from '@shared/questionnaire/blocks/price-thresholds-block';
import { purchaseRecallAnswerSchema } from '@shared/questionnaire/blocks/purchase-recall-block';
import { shelfObservationAnswerSchema } from '@shared/questionnaire/blocks/shelf-observation-block';
import { wtpOpenAnswerSchema } from '@shared/questionnaire/blocks/wtp-open-block';

/**
 * The block's answer schema with the amounts in its messages written by `words`: the kinds
 * whose messages name an amount take it; every other kind is `answerSchemaFor` itself.
 */
export function answerSchemaInCurrency(block: Block, words: AmountWords): z.ZodType {
  switch (block.kind) {
    case 'price-ladder':
      return priceLadderAnswerSchema(block, words);
    case 'price-thresholds':
      return priceThresholdsAnswerSchema(block, words);
    case 'wtp-open':
      return wtpOpenAnswerSchema(block, words);
    case 'shelf-observation':
      return shelfObservationAnswerSchema(block, words);
    case 'purchase-recall':
      return purchaseRecallAnswerSchema(block, words);
    default:
      return answerSchemaFor(block);
  }
}
