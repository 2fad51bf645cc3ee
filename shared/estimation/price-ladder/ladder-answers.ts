import { EstimationError } from '../estimation-error';

/** One answer of one respondent at one price of the ladder. */
export interface LadderAnswer {
  readonly respondent: string | number;
  readonly price: number;
  /** 1 = would buy, 0 = would not (yes/no scale), or 1–5 on the intent scale. */
  readonly buy: number;
  /** Survey weight of the respondent; default 1. */
  readonly weight?: number;
  /**
   * Respondents who answered exactly as this one did, all their prices alike (default 1): a
   * frequency table's cell, whose `weight` is then count × one respondent's weight.
   */
  readonly count?: number;
}

/** 'yes-no' answers 0/1; 'intent-5' answers 1 (certainly not) … 5 (certainly would buy). */
export type LadderScale = 'yes-no' | 'intent-5';

/** Purchase probability assigned to each intent level 1–5. */
export type IntentCalibration = Readonly<Record<1 | 2 | 3 | 4 | 5, number>>;

/**
 * Default calibration of the 5-point intent scale: 5 → 0.7, 4 → 0.5, 3 → 0.3, 2 → 0.1, 1 → 0.
 * Common practice / from memory (not verified against a source); override it per study.
 */
export const defaultIntentCalibration: IntentCalibration = { 5: 0.7, 4: 0.5, 3: 0.3, 2: 0.1, 1: 0 };

/** Validates the answers and turns each into a purchase probability in [0, 1]. */
export function toPurchaseProbabilities(
  answers: readonly LadderAnswer[],
  scale: LadderScale,
  calibration: IntentCalibration,
): number[] {
  if (answers.length === 0) {
    throw new EstimationError('too-few-observations', 'there are no ladder answers', 'buy');
  }
  validateCalibration(calibration);
  const seen = new Set<string>();
  return answers.map((a, i) => {
    const where = `answer ${i + 1} (respondent ${a.respondent})`;
    if (!Number.isFinite(a.price) || a.price < 0) {
      throw new EstimationError('invalid-value', `${where}: price must be a number ≥ 0`, 'price');
    }
    if (a.weight !== undefined && !(Number.isFinite(a.weight) && a.weight > 0)) {
      throw new EstimationError('invalid-value', `${where}: weight must be a number > 0`, 'weight');
    }
    const key = `${a.respondent}\u0000${a.price}`;
    if (seen.has(key)) {
      throw new EstimationError(
        'duplicate-answer',
        `${where} answers price ${a.price} twice`,
        'price',
      );
    }
    seen.add(key);
    if (scale === 'yes-no') {
      if (a.buy !== 0 && a.buy !== 1) {
        throw new EstimationError('invalid-value', `${where}: buy must be 0 or 1`, 'buy');
      }
      return a.buy;
    }
    if (![1, 2, 3, 4, 5].includes(a.buy)) {
      throw new EstimationError('invalid-value', `${where}: intent must be an integer 1–5`, 'buy');
    }
    return calibration[a.buy as 1 | 2 | 3 | 4 | 5];
  });
}

function validateCalibration(calibration: IntentCalibration): void {
  for (const level of [1, 2, 3, 4, 5] as const) {
    const p = calibration[level];
    if (!(p >= 0 && p <= 1)) {
      throw new EstimationError(
        'invalid-value',
        `calibration for intent ${level} must lie in [0, 1]`,
        'calibration',
      );
    }
  }
}
