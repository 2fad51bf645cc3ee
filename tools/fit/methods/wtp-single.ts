import { analyseDichotomousChoice } from '@shared/estimation/willingness-to-pay/dichotomous-choice';
import type { FitMethod } from '../fit-method';
import { numberOption, scheduleOption, weightsOption, yesNoColumn } from './survey-options';

/**
 * Single-bounded dichotomous choice. Columns: bid, yes (yes/no or 1/0). Options: --weights COL,
 * --level 0.95, --grid FROM:TO:STEPS.
 */
export const wtpSingleMethod: FitMethod = {
  name: 'wtp-single',
  run(table, options) {
    const bids = table.numbers('bid');
    const yes = yesNoColumn(table, 'yes');
    const weights = weightsOption(table, options);
    const level = numberOption(options, 'level', 0.95) ?? 0.95;
    const answers = bids.map((bid, i) => ({ bid, yes: yes[i], weight: weights?.[i] }));
    const { curve, ...plain } = analyseDichotomousChoice(answers, 'single-bounded', level);
    return { method: 'wtp-single', ...plain, ...scheduleOption(curve, options, level) };
  },
};
