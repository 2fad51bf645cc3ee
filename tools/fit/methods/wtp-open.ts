import { analyseOpenEndedWtp } from '@shared/estimation/willingness-to-pay/open-ended-wtp';
import type { FitMethod } from '../fit-method';
import { numberOption, scheduleOption, weightsOption } from './survey-options';

/**
 * Open-ended willingness to pay. Column: wtp. Options: --weights COL, --replicates N (bootstrap,
 * default 2000), --seed N, --level 0.95, --grid FROM:TO:STEPS.
 */
export const wtpOpenMethod: FitMethod = {
  name: 'wtp-open',
  run(table, options) {
    const level = numberOption(options, 'level', 0.95) ?? 0.95;
    const result = analyseOpenEndedWtp({
      wtp: table.numbers('wtp'),
      weights: weightsOption(table, options),
      replicates: numberOption(options, 'replicates'),
      seed: numberOption(options, 'seed'),
      confidenceLevel: level,
    });
    const { curve, ...plain } = result;
    return { method: 'wtp-open', ...plain, ...scheduleOption(curve, options, level) };
  },
};
