import { analysePriceLadder } from '@shared/estimation/price-ladder/price-ladder';
import type { FitMethod } from '../fit-method';
import {
  calibrationOption,
  choiceOption,
  numberOption,
  scheduleOption,
  weightsOption,
} from './survey-options';

/**
 * Gabor–Granger price ladder. Columns: respondent, price, buy (0/1, or 1–5 with --scale intent-5).
 * Options: --cost N, --scale yes-no|intent-5, --calibration 5:0.7,…, --monotone RULE,
 * --weights COL, --level 0.95, --grid FROM:TO:STEPS.
 */
export const priceLadderMethod: FitMethod = {
  name: 'price-ladder',
  run(table, options) {
    const respondents = table.texts('respondent');
    const prices = table.numbers('price');
    const buys = table.numbers('buy');
    const weights = weightsOption(table, options);
    const level = numberOption(options, 'level', 0.95) ?? 0.95;
    const result = analysePriceLadder({
      answers: respondents.map((respondent, i) => ({
        respondent,
        price: prices[i],
        buy: buys[i],
        weight: weights?.[i],
      })),
      scale: choiceOption(options, 'scale', ['yes-no', 'intent-5'], 'yes-no'),
      calibration: calibrationOption(options),
      monotoneRule: choiceOption(
        options,
        'monotone',
        ['carry-no-upward', 'carry-yes-downward', 'keep'],
        'carry-no-upward',
      ),
      unitCost: numberOption(options, 'cost'),
      confidenceLevel: level,
    });
    const { curve, ...plain } = result;
    return { method: 'price-ladder', ...plain, ...scheduleOption(curve, options, level) };
  },
};
