import type { AnalysisMethod } from '@shared/analysis/analysis-method';
import type { RespondentProfile } from './respondent-profile';

/** One shelf observation or purchase recall: a price and the quantity bought at it. */
export interface ObservedRow {
  readonly interviewId: string;
  readonly pointId: string | null;
  readonly region: string | null;
  readonly price: number;
  /** Units per 30 days. */
  readonly quantity: number;
  readonly income: number | null;
  readonly householdSize: number | null;
  /** Mean price at the other points of the same region (the peer-price instrument). */
  readonly peerPrice: number | null;
}

/**
 * A stated-preference row is one respondent, or — read from a study's frequency table — one
 * cell of `count` respondents who answered alike (and share raking levels); its `interviewId`
 * then names the cell, and its weight is count × one respondent's weight.
 */
interface Tabulated {
  readonly count?: number;
}

export interface LadderRow extends Tabulated {
  readonly interviewId: string;
  readonly scale: 'yes-no' | 'intent-5';
  /** buy: 1/0 on the yes/no scale, 1–5 on the intent scale. */
  readonly steps: readonly { readonly price: number; readonly buy: number }[];
}

export interface ThresholdRow extends Tabulated {
  readonly interviewId: string;
  readonly tooCheap: number;
  readonly cheap: number;
  readonly expensive: number;
  readonly tooExpensive: number;
  readonly likelihoodCheap: number | null;
  readonly likelihoodExpensive: number | null;
}

export interface WtpOpenRow extends Tabulated {
  readonly interviewId: string;
  readonly amount: number;
}

/** WTP in [lower, upper); upper null for the open top interval. */
export interface CardRow extends Tabulated {
  readonly interviewId: string;
  readonly lower: number;
  readonly upper: number | null;
}

export interface BidRow extends Tabulated {
  readonly interviewId: string;
  readonly bid: number;
  readonly yes: boolean;
  readonly bid2: number | null;
  readonly yes2: boolean | null;
}

export interface RowsByMethod {
  'observed-prices': ObservedRow;
  'price-ladder': LadderRow;
  'price-thresholds': ThresholdRow;
  'wtp-open': WtpOpenRow;
  'payment-card': CardRow;
  'dichotomous-choice': BidRow;
}

/**
 * The rows a fit runs on, one respondent's rows together and respondents in interview-id order,
 * with what each respondent is for weighting and what was left out and why.
 */
export interface AnalysisDataset<M extends AnalysisMethod = AnalysisMethod> {
  readonly method: M;
  readonly rows: readonly RowsByMethod[M][];
  readonly blockIds: readonly string[];
  /** Prices the questionnaire fixed (ladder prices, bids, card amounts), in major units. */
  readonly designLevels: readonly number[] | null;
  /** Single- or double-bounded (dichotomous choice only). */
  readonly bounds: 'single' | 'double' | null;
  readonly profiles: ReadonlyMap<string, RespondentProfile>;
  readonly interviewsMatched: number;
  readonly skipped: readonly { reason: string; count: number }[];
}

/** Respondents a row stands for: 1, or a frequency-table cell's count. */
export const respondentsOf = (row: { readonly count?: number }): number => row.count ?? 1;

/** Respondents in the order of their first row. */
export function respondentIds(dataset: AnalysisDataset): string[] {
  return [...new Set(dataset.rows.map((row) => row.interviewId))];
}
