import type { Block } from './block';
import { consentAnswerFits } from './blocks/consent-block';
import { dichotomousChoiceAnswerFits } from './blocks/dichotomous-choice-block';
import { householdSizeAnswerFits } from './blocks/household-size-block';
import { incomeBandAnswerFits } from './blocks/income-band-block';
import { locationAnswerFits } from './blocks/location-block';
import { multipleChoiceAnswerFits } from './blocks/multiple-choice-block';
import { numberAnswerFits } from './blocks/number-block';
import { paymentCardAnswerFits } from './blocks/payment-card-block';
import { photoAnswerFits } from './blocks/photo-block';
import { priceLadderAnswerFits } from './blocks/price-ladder-block';
import { priceThresholdsAnswerFits } from './blocks/price-thresholds-block';
import { purchaseRecallAnswerFits } from './blocks/purchase-recall-block';
import { shelfObservationAnswerFits } from './blocks/shelf-observation-block';
import { singleChoiceAnswerFits } from './blocks/single-choice-block';
import { textAnswerFits } from './blocks/text-block';
import { wtpOpenAnswerFits } from './blocks/wtp-open-block';

/**
 * A quick test of one block's answer, in plain code: true only for answers the block's schema
 * (`answerSchemaFor`) accepts, so a true needs no second look; false says nothing more, and
 * the schema then decides and words the problems. Checking an answer this way costs a small
 * part of a zod parse, which adds up over thousands of synced interviews.
 *
 * Each kind's test sits beside its schema: a schema made stricter needs its test made stricter
 * too (the specs feed both the same answers to catch a test that lets more through).
 */
export function answerFitsFor(block: Block): (answer: unknown) => boolean {
  switch (block.kind) {
    case 'consent':
      return consentAnswerFits(block);
    case 'price-ladder':
      return priceLadderAnswerFits(block);
    case 'price-thresholds':
      return priceThresholdsAnswerFits(block);
    case 'wtp-open':
      return wtpOpenAnswerFits(block);
    case 'payment-card':
      return paymentCardAnswerFits(block);
    case 'dichotomous-choice':
      return dichotomousChoiceAnswerFits(block);
    case 'shelf-observation':
      return shelfObservationAnswerFits(block);
    case 'purchase-recall':
      return purchaseRecallAnswerFits(block);
    case 'household-size':
      return householdSizeAnswerFits(block);
    case 'income-band':
      return incomeBandAnswerFits(block);
    case 'location':
      return locationAnswerFits(block);
    case 'photo':
      return photoAnswerFits(block);
    case 'single-choice':
      return singleChoiceAnswerFits(block);
    case 'multiple-choice':
      return multipleChoiceAnswerFits(block);
    case 'number':
      return numberAnswerFits(block);
    case 'text':
      return textAnswerFits(block);
  }
}
