import type { BlockKind } from './block-kind';
import type { ConsentAnswer } from './blocks/consent-block';
import type { DichotomousChoiceAnswer } from './blocks/dichotomous-choice-block';
import type { HouseholdSizeAnswer } from './blocks/household-size-block';
import type { IncomeBandAnswer } from './blocks/income-band-block';
import type { LocationAnswer } from './blocks/location-block';
import type { MultipleChoiceAnswer } from './blocks/multiple-choice-block';
import type { NumberAnswer } from './blocks/number-block';
import type { PaymentCardAnswer } from './blocks/payment-card-block';
import type { PhotoAnswer } from './blocks/photo-block';
import type { PriceLadderAnswer } from './blocks/price-ladder-block';
import type { PriceThresholdsAnswer } from './blocks/price-thresholds-block';
import type { PurchaseRecallAnswer } from './blocks/purchase-recall-block';
import type { ShelfObservationAnswer } from './blocks/shelf-observation-block';
import type { SingleChoiceAnswer } from './blocks/single-choice-block';
import type { TextAnswer } from './blocks/text-block';
import type { WtpOpenAnswer } from './blocks/wtp-open-block';

/** What the device records for each kind of block (see `answerSchemaFor` for the checks). */
export interface AnswerByKind {
  consent: ConsentAnswer;
  'price-ladder': PriceLadderAnswer;
  'price-thresholds': PriceThresholdsAnswer;
  'wtp-open': WtpOpenAnswer;
  'payment-card': PaymentCardAnswer;
  'dichotomous-choice': DichotomousChoiceAnswer;
  'shelf-observation': ShelfObservationAnswer;
  'purchase-recall': PurchaseRecallAnswer;
  'household-size': HouseholdSizeAnswer;
  'income-band': IncomeBandAnswer;
  location: LocationAnswer;
  photo: PhotoAnswer;
  'single-choice': SingleChoiceAnswer;
  'multiple-choice': MultipleChoiceAnswer;
  number: NumberAnswer;
  text: TextAnswer;
}

export type AnswerOfKind<K extends BlockKind> = AnswerByKind[K];

/** One interview's answers, keyed by block id; a block not asked or not answered is absent. */
export type InterviewAnswers = Readonly<Record<string, unknown>>;
