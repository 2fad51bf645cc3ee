import type { FittedDemandCurve } from '../estimation/demand-schedule/fitted-demand-curve';
import {
  linearRegressionDemand,
  logLogRegressionDemand,
} from '../estimation/demand-schedule/regression-demand-curves';
import {
  logisticDistribution,
  normalDistribution,
} from '../estimation/maximum-likelihood/latent-distribution';
import { logisticPurchaseCurve } from '../estimation/price-ladder/logistic-purchase-curve';
import { wtpModelCurve } from '../estimation/willingness-to-pay/wtp-model-summary';
import type { CurveDescription } from './curve-description';
import { piecewiseShareCurve, stepShareCurve } from './tabulated-share-curves';
import { semiLogRegressionDemand } from './semilog-demand-curve';

/**
 * Rebuilds the demand curve a fit result describes, with its confidence band where the model
 * gives one: the same engine functions the server used, so browser and server agree to the bit.
 */
export function fittedCurveFrom(description: CurveDescription): FittedDemandCurve {
  switch (description.kind) {
    case 'linear':
    case 'loglog': {
      const fit = { ...description, dfResidual: description.dfResidual ?? undefined };
      return description.kind === 'linear'
        ? linearRegressionDemand(fit)
        : logLogRegressionDemand(fit);
    }
    case 'semilog':
      return semiLogRegressionDemand(description);
    case 'logistic-share': {
      const { intercept, slope, covariance } = description;
      const logit = {
        intercept,
        slope,
        logLikelihood: 0,
        modelCovariance: covariance,
        robustCovariance: covariance,
        clusterCount: 0,
        iterations: 0,
      };
      return logisticPurchaseCurve(
        logit,
        covariance,
        description.observedPriceRange,
        description.n,
      );
    }
    case 'wtp-model': {
      const { alpha, beta, covariance } = description;
      const dist =
        description.distribution === 'normal' ? normalDistribution : logisticDistribution;
      const fit = { alpha, beta, covariance, logLikelihood: 0, iterations: 0 };
      return wtpModelCurve(
        fit,
        dist,
        description.method,
        description.observedPriceRange,
        description.n,
      );
    }
    case 'step-share':
      return stepShareCurve(description);
    case 'piecewise-share':
      return piecewiseShareCurve(description);
  }
}
