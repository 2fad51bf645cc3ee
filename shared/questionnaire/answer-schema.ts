import type { z } from 'zod';
import type { Block } from './block';
import { consentAnswerSchema } from './blocks/consent-block';
import { dichotomousChoiceAnswerSchema } from './blocks/dichotomous-choice-block';
import { householdSizeAnswerSchema } from './blocks/household-size-block';
import { incomeBandAnswerSchema } from './blocks/income-band-block';
import { locationAnswerSchema } from './blocks/location-block';
import { multipleChoiceAnswerSchema } from './blocks/multiple-choice-block';
import { numberAnswerSchema } from './blocks/number-block';
import { paymentCardAnswerSchema } from './blocks/payment-card-block';
import { photoAnswerSchema } from './blocks/photo-block';
import { priceLadderAnswerSchema } from './blocks/price-ladder-block';
import { priceThresholdsAnswerSchema } from './blocks/price-thresholds-block';
import { purchaseRecallAnswerSchema } from './blocks/purchase-recall-block';
import { shelfObservationAnswerSchema } from './blocks/shelf-observation-block';
import { singleChoiceAnswerSchema } from './blocks/single-choice-block';
import { textAnswerSchema } from './blocks/text-block';
import { wtpOpenAnswerSchema } from './blocks/wtp-open-block';

/**
 * The schema of what an enumerator's device records for one block, built from the block's own
 * settings (its prices, options, ranges), so a synced answer is checked against the exact
 * version it was collected with.
 */
export function answerSchemaFor(block: Block): z.ZodType {
  switch (block.kind) {
    case 'consent':
      return consentAnswerSchema(block);
    case 'price-ladder':
      return priceLadderAnswerSchema(block);
    case 'price-thresholds':
      return priceThresholdsAnswerSchema(block);
    case 'wtp-open':
      return wtpOpenAnswerSchema(block);
    case 'payment-card':
      return paymentCardAnswerSchema(block);
    case 'dichotomous-choice':
      return dichotomousChoiceAnswerSchema(block);
    case 'shelf-observation':
      return shelfObservationAnswerSchema(block);
    case 'purchase-recall':
      return purchaseRecallAnswerSchema(block);
    case 'household-size':
      return householdSizeAnswerSchema(block);
    case 'income-band':
      return incomeBandAnswerSchema(block);
    case 'location':
      return locationAnswerSchema(block);
    case 'photo':
      return photoAnswerSchema(block);
    case 'single-choice':
      return singleChoiceAnswerSchema(block);
    case 'multiple-choice':
      return multipleChoiceAnswerSchema(block);
    case 'number':
      return numberAnswerSchema(block);
    case 'text':
      return textAnswerSchema(block);
  }
}
