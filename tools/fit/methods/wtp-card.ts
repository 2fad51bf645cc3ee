import { EstimationError } from '@shared/estimation/estimation-error';
import { analysePaymentCard } from '@shared/estimation/willingness-to-pay/payment-card';
import type { FitMethod } from '../fit-method';
import { choiceOption, numberOption, scheduleOption, weightsOption } from './survey-options';

/**
 * Payment card (interval) WTP. Columns: lower, upper — the chosen amount and the next one on the
 * card; leave upper empty (or write "open") for the top interval. Options: --distribution
 * normal|logistic, --weights COL, --level 0.95, --grid FROM:TO:STEPS.
 */
export const wtpCardMethod: FitMethod = {
  name: 'wtp-card',
  run(table, options) {
    const lower = table.numbers('lower');
    const upper = table.texts('upper').map((cell, i) => {
      const v = cell.trim().toLowerCase();
      if (v === '' || v === 'open') return Infinity;
      const value = Number(v);
      if (!Number.isFinite(value)) {
        throw new EstimationError(
          'invalid-value',
          `column upper, row ${i + 1}: "${cell}" is not a number (leave empty for the open top)`,
          'upper',
        );
      }
      return value;
    });
    const weights = weightsOption(table, options);
    const level = numberOption(options, 'level', 0.95) ?? 0.95;
    const intervals = lower.map((lo, i) => ({ lower: lo, upper: upper[i], weight: weights?.[i] }));
    const distribution = choiceOption(options, 'distribution', ['normal', 'logistic'], 'normal');
    const { curve, ...plain } = analysePaymentCard(intervals, distribution, level);
    return { method: 'wtp-card', ...plain, ...scheduleOption(curve, options, level) };
  },
};
