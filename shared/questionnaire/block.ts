import { z } from 'zod';
import type { BlockKind } from './block-kind';
import { consentBlockSchema } from './blocks/consent-block';
import { dichotomousChoiceBlockSchema } from './blocks/dichotomous-choice-block';
import { householdSizeBlockSchema } from './blocks/household-size-block';
import { incomeBandBlockSchema } from './blocks/income-band-block';
import { locationBlockSchema } from './blocks/location-block';
import { multipleChoiceBlockSchema } from './blocks/multiple-choice-block';
import { numberBlockSchema } from './blocks/number-block';
import { paymentCardBlockSchema } from './blocks/payment-card-block';
import { photoBlockSchema } from './blocks/photo-block';
import { priceLadderBlockSchema } from './blocks/price-ladder-block';
import { priceThresholdsBlockSchema } from './blocks/price-thresholds-block';
import { purchaseRecallBlockSchema } from './blocks/purchase-recall-block';
import { shelfObservationBlockSchema } from './blocks/shelf-observation-block';
import { singleChoiceBlockSchema } from './blocks/single-choice-block';
import { textBlockSchema } from './blocks/text-block';
import { wtpOpenBlockSchema } from './blocks/wtp-open-block';

/** Any block of a questionnaire, told apart by its `kind`. */
export const blockSchema = z.discriminatedUnion('kind', [
  consentBlockSchema,
  priceLadderBlockSchema,
  priceThresholdsBlockSchema,
  wtpOpenBlockSchema,
  paymentCardBlockSchema,
  dichotomousChoiceBlockSchema,
  shelfObservationBlockSchema,
  purchaseRecallBlockSchema,
  householdSizeBlockSchema,
  incomeBandBlockSchema,
  locationBlockSchema,
  photoBlockSchema,
  singleChoiceBlockSchema,
  multipleChoiceBlockSchema,
  numberBlockSchema,
  textBlockSchema,
]);

export type Block = z.infer<typeof blockSchema>;

/** The block type of one kind: `BlockOfKind<'price-ladder'>`. */
export type BlockOfKind<K extends BlockKind> = Extract<Block, { kind: K }>;
