import { analyseDichotomousChoice } from '@shared/estimation/willingness-to-pay/dichotomous-choice';
import type { FitMethod } from '../fit-method';
import { numberOption, scheduleOption, weightsOption, yesNoColumn } from './survey-options';

/**
 * Double-bounded dichotomous choice. Columns: bid, yes (first answer), bid2 (the follow-up bid,
 * higher after a yes, lower after a no), yes2 (follow-up answer). Options: --weights COL,
 * --level 0.95, --grid FROM:TO:STEPS.
 */
export const wtpDoubleMethod: FitMethod = {
  name: 'wtp-double',
  run(table, options) {
    const bids = table.numbers('bid');
    const yes = yesNoColumn(table, 'yes');
    const bids2 = table.numbers('bid2');
    const yes2 = yesNoColumn(table, 'yes2');
    const weights = weightsOption(table, options);
    const level = numberOption(options, 'level', 0.95) ?? 0.95;
    const answers = bids.map((bid, i) => ({
      bid,
      yes: yes[i],
      bid2: bids2[i],
      yes2: yes2[i],
      weight: weights?.[i],
    }));
    const { curve, ...plain } = analyseDichotomousChoice(answers, 'double-bounded', level);
    return { method: 'wtp-double', ...plain, ...scheduleOption(curve, options, level) };
  },
};
