import type { FitSpecOf } from '@shared/analysis/fit-spec';
import type { PurchaseRecallAnswer } from '@shared/questionnaire/blocks/purchase-recall-block';
import type { ShelfObservationAnswer } from '@shared/questionnaire/blocks/shelf-observation-block';
import { answeredBlock, toMajor, type AnalysisInterview } from '../analysis-interview';
import type { ObservedRow } from '../analysis-dataset';
import type { RespondentProfile } from '../respondent-profile';
import type { Extraction } from './extraction';

/** Quantities are compared per 30 days, whatever period a block counted over. */
const perThirtyDays = (units: number, periodDays: number) => (units * 30) / periodDays;

/**
 * A shelf observation (price per pack unit, units sold per 30 days in pack units) or a purchase
 * recall (price paid, units per 30 days). Covariates the spec uses must be stated.
 */
export function extractObserved(
  interview: AnalysisInterview,
  spec: FitSpecOf<'observed-prices'>,
  digits: number,
  profile: RespondentProfile,
): Extraction<ObservedRow> {
  const observation =
    spec.source === 'shelf' ? shelf(interview, spec, digits) : recall(interview, spec, digits);
  if ('skip' in observation) return observation;
  if (spec.covariates.includes('income') && profile.income === null)
    return { skip: 'income band not stated (income is a covariate)' };
  if (spec.covariates.includes('household-size') && profile.householdSize === null)
    return { skip: 'household size not stated (a covariate)' };
  const row: ObservedRow = {
    interviewId: interview.id,
    pointId: interview.pointId,
    region: interview.region,
    price: observation.price,
    quantity: observation.quantity,
    income: profile.income,
    householdSize: profile.householdSize,
    peerPrice: null,
  };
  return { rows: [row], blockId: observation.blockId };
}

type Observation = { price: number; quantity: number; blockId: string } | { skip: string };

function shelf(
  interview: AnalysisInterview,
  spec: { blockId?: string },
  digits: number,
): Observation {
  const found = answeredBlock(interview, 'shelf-observation', spec.blockId);
  if (!found) return { skip: 'no answered shelf observation' };
  const { block } = found;
  if (block.measure !== 'units-sold' || block.periodDays === undefined)
    return { skip: 'the shelf observation counts stock on hand, not units sold' };
  const answer = found.answer as ShelfObservationAnswer;
  return {
    price: toMajor(answer.priceMinor, digits) / answer.packSize,
    quantity: perThirtyDays(answer.quantity * answer.packSize, block.periodDays),
    blockId: block.id,
  };
}

function recall(
  interview: AnalysisInterview,
  spec: { blockId?: string },
  digits: number,
): Observation {
  const found = answeredBlock(interview, 'purchase-recall', spec.blockId);
  if (!found) return { skip: 'no answered purchase recall' };
  const answer = found.answer as PurchaseRecallAnswer;
  if (answer.pricePaidMinor === undefined)
    return { skip: 'purchase recall without a price paid (nothing bought)' };
  return {
    price: toMajor(answer.pricePaidMinor, digits),
    quantity: perThirtyDays(answer.units, found.block.periodDays),
    blockId: found.block.id,
  };
}
