import type { ThresholdField } from '@shared/questionnaire/blocks/price-thresholds-block';

/**
 * The four price thresholds named as the questions put them to the respondent (see
 * `thresholdQuestions`), so answers and flags on the review screens use the same words.
 */
export const thresholdNames: Readonly<Record<ThresholdField, string>> = {
  tooCheapMinor: 'too cheap',
  cheapMinor: 'a bargain',
  expensiveMinor: 'expensive',
  tooExpensiveMinor: 'too expensive',
};
