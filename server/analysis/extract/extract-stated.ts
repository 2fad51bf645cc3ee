import type { DichotomousChoiceAnswer } from '@shared/questionnaire/blocks/dichotomous-choice-block';
import type { PaymentCardAnswer } from '@shared/questionnaire/blocks/payment-card-block';
import type { PriceLadderAnswer } from '@shared/questionnaire/blocks/price-ladder-block';
import type { PriceThresholdsAnswer } from '@shared/questionnaire/blocks/price-thresholds-block';
import type { WtpOpenAnswer } from '@shared/questionnaire/blocks/wtp-open-block';
import { answeredBlock, toMajor, type AnalysisInterview } from '../analysis-interview';
import type { BidRow, CardRow, LadderRow, ThresholdRow, WtpOpenRow } from '../analysis-dataset';
import { notAnswered, type Extraction } from './extraction';

type Read<R> = (
  interview: AnalysisInterview,
  blockId: string | undefined,
  digits: number,
) => Extraction<R>;

/** A price ladder: the price asked at each step and the answer (1/0, or intent 1–5). */
export const extractLadder: Read<LadderRow> = (interview, blockId, digits) => {
  const found = answeredBlock(interview, 'price-ladder', blockId);
  if (!found) return notAnswered('price ladder');
  const { block } = found;
  const answer = found.answer as PriceLadderAnswer;
  const steps = answer.steps.map((step) => ({
    price: toMajor(step.priceMinor, digits),
    buy: typeof step.response === 'number' ? step.response : step.response === 'yes' ? 1 : 0,
  }));
  const row = { interviewId: interview.id, scale: block.scale, steps };
  const design = block.pricesMinor.map((p) => toMajor(p, digits));
  return { rows: [row], blockId: block.id, design };
};

/** The four price thresholds and, when asked, the two purchase likelihoods. */
export const extractThresholds: Read<ThresholdRow> = (interview, blockId, digits) => {
  const found = answeredBlock(interview, 'price-thresholds', blockId);
  if (!found) return notAnswered('price thresholds');
  const a = found.answer as PriceThresholdsAnswer;
  const row: ThresholdRow = {
    interviewId: interview.id,
    tooCheap: toMajor(a.tooCheapMinor, digits),
    cheap: toMajor(a.cheapMinor, digits),
    expensive: toMajor(a.expensiveMinor, digits),
    tooExpensive: toMajor(a.tooExpensiveMinor, digits),
    likelihoodCheap: a.likelihoodCheap ?? null,
    likelihoodExpensive: a.likelihoodExpensive ?? null,
  };
  return { rows: [row], blockId: found.block.id };
};

/** The most the respondent would pay. */
export const extractWtpOpen: Read<WtpOpenRow> = (interview, blockId, digits) => {
  const found = answeredBlock(interview, 'wtp-open', blockId);
  if (!found) return notAnswered('open willingness to pay');
  const amount = toMajor((found.answer as WtpOpenAnswer).amountMinor, digits);
  return { rows: [{ interviewId: interview.id, amount }], blockId: found.block.id };
};

/**
 * The card interval: from the highest amount they would pay up to the next amount on the card
 * (open above the top amount); "none of them" is [0, first amount).
 */
export const extractCard: Read<CardRow> = (interview, blockId, digits) => {
  const found = answeredBlock(interview, 'payment-card', blockId);
  if (!found) return notAnswered('payment card');
  const amounts = found.block.amountsMinor;
  const highest = (found.answer as PaymentCardAnswer).highestYesMinor;
  const k = highest === null ? -1 : amounts.indexOf(highest);
  const lower = k < 0 ? 0 : toMajor(amounts[k], digits);
  const next = amounts[k + 1];
  const row = {
    interviewId: interview.id,
    lower,
    upper: next === undefined ? null : toMajor(next, digits),
  };
  return { rows: [row], blockId: found.block.id, design: amounts.map((a) => toMajor(a, digits)) };
};

/** The bid and answer, with the follow-up bid and answer for double-bounded blocks. */
export const extractBid: Read<BidRow> = (interview, blockId, digits) => {
  const found = answeredBlock(interview, 'dichotomous-choice', blockId);
  if (!found) return notAnswered('dichotomous choice');
  const a = found.answer as DichotomousChoiceAnswer;
  const double = found.block.bounds === 'double';
  const row: BidRow = {
    interviewId: interview.id,
    bid: toMajor(a.bidMinor, digits),
    yes: a.firstResponse === 'yes',
    bid2: double && a.followUpMinor !== undefined ? toMajor(a.followUpMinor, digits) : null,
    yes2: double && a.secondResponse !== undefined ? a.secondResponse === 'yes' : null,
  };
  const design = found.block.bidDesign.levels.flatMap((l) =>
    [l.bidMinor, l.afterYesMinor, l.afterNoMinor]
      .filter((v) => v !== undefined)
      .map((v) => toMajor(v, digits)),
  );
  return { rows: [row], blockId: found.block.id, design, bounds: found.block.bounds };
};
