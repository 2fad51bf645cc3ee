import { analysePriceThresholds } from '@shared/estimation/price-thresholds/price-thresholds';
import type { TrialCurve } from '@shared/estimation/price-thresholds/trial-curve';
import type { FitMethod } from '../fit-method';
import { calibrationOption, choiceOption, weightsOption } from './survey-options';

/**
 * Van Westendorp price thresholds. Columns: too_cheap, cheap, expensive, too_expensive; when the
 * file also has likelihood_cheap and likelihood_expensive (1–5), or with --trial (which requires
 * them), the Newton–Miller–Smith trial and revenue curves too. Options: --convention cheap-expensive|not-cheap-not-expensive,
 * --tie-rule midpoint|first, --out-of-order exclude|keep, --calibration 5:0.7,…, --weights COL.
 */
export const priceThresholdsMethod: FitMethod = {
  name: 'price-thresholds',
  run(table, options) {
    const tooCheap = table.numbers('too_cheap');
    const cheap = table.numbers('cheap');
    const expensive = table.numbers('expensive');
    const tooExpensive = table.numbers('too_expensive');
    const weights = weightsOption(table, options);
    const withTrial =
      options['trial'] === true ||
      (table.has('likelihood_cheap') && table.has('likelihood_expensive'));
    const likelyCheap = withTrial ? table.numbers('likelihood_cheap') : undefined;
    const likelyExpensive = withTrial ? table.numbers('likelihood_expensive') : undefined;
    const answers = tooCheap.map((tc, i) => ({
      tooCheap: tc,
      cheap: cheap[i],
      expensive: expensive[i],
      tooExpensive: tooExpensive[i],
      weight: weights?.[i],
      likelihoodCheap: likelyCheap?.[i],
      likelihoodExpensive: likelyExpensive?.[i],
    }));
    const result = analysePriceThresholds({
      answers,
      convention: choiceOption(
        options,
        'convention',
        ['cheap-expensive', 'not-cheap-not-expensive'],
        'cheap-expensive',
      ),
      tieRule: choiceOption(options, 'tie-rule', ['midpoint', 'first'], 'midpoint'),
      outOfOrder: choiceOption(options, 'out-of-order', ['exclude', 'keep'], 'exclude'),
      withTrialCurve: withTrial,
      trialCalibration: calibrationOption(options),
    });
    const { trial, ...plain } = result;
    return {
      method: 'price-thresholds',
      ...plain,
      ...(trial ? { trial: trialSummary(trial) } : {}),
    };
  },
};

/** The Newton–Miller–Smith results under plain names. */
function trialSummary(curve: TrialCurve): Record<string, unknown> {
  return {
    maxTrialPrice: curve.maxTrial.price,
    maxTrial: curve.maxTrial,
    revenueMaxPrice: curve.maxRevenue.price,
    maxRevenue: curve.maxRevenue.value,
    curve: curve.prices.map((price, k) => ({
      price,
      trial: curve.trial[k],
      revenue: curve.revenue[k],
    })),
  };
}
