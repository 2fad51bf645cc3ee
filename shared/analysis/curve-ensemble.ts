import type { CurveDescription } from './curve-description';
import { fittedCurveFrom } from './fitted-curve';
import type { FittedDemandCurve } from '../estimation/demand-schedule/fitted-demand-curve';
import type { DemandCurve } from '../estimation/welfare/demand-curve';
import type { CurveEnsemble } from './estimated-figure';
import { normalParameterDraws } from './parameter-draws';

/** Enough draws for stable 95 % percentiles while the screen stays responsive. */
export const defaultDrawCount = 400;

/** The two estimated parameters of a description and how to put drawn values back. */
function parametersOf(
  description: CurveDescription,
): { mean: number[]; covariance: number[][]; with: (v: number[]) => CurveDescription } | null {
  switch (description.kind) {
    case 'linear':
    case 'loglog':
    case 'semilog':
      return {
        mean: [description.intercept, description.priceCoefficient],
        covariance: description.covariance,
        with: ([intercept, priceCoefficient]) => ({ ...description, intercept, priceCoefficient }),
      };
    case 'logistic-share':
      return {
        mean: [description.intercept, description.slope],
        covariance: description.covariance,
        with: ([intercept, slope]) => ({ ...description, intercept, slope }),
      };
    case 'wtp-model':
      return {
        mean: [description.alpha, description.beta],
        covariance: description.covariance,
        with: ([alpha, beta]) => ({ ...description, alpha, beta }),
      };
    case 'step-share':
    case 'piecewise-share':
      return null;
  }
}

/** The curves of a tabulated description's respondent resamples (none when it has none). */
function resampledCurves(description: CurveDescription): CurveDescription[] {
  if (description.kind === 'step-share') {
    return (description.resampledShares ?? []).map((shares) => ({
      ...description,
      points: description.points.map((point, i) => ({ price: point.price, share: shares[i] })),
      resampledShares: undefined,
    }));
  }
  if (description.kind === 'piecewise-share') {
    return (description.resampledShares ?? []).map((shares) => ({
      ...description,
      shares,
      resampledShares: undefined,
    }));
  }
  return [];
}

/**
 * The fitted curve and `count` curves rebuilt from parameter draws, for intervals of derived
 * figures (elasticity, optimal prices, surplus, policy effects). A draw whose parameters give no
 * valid curve (a rising linear demand, say) is dropped and counts as a draw without a value.
 * Step and piecewise curves have no parameters to draw: their draws are the curves of their
 * respondent resamples, when the fit kept them, and otherwise their figures have no interval.
 */
export function curveEnsemble(
  description: CurveDescription,
  confidenceLevel: number,
  count = defaultDrawCount,
): CurveEnsemble & { readonly central: FittedDemandCurve } {
  const central = fittedCurveFrom(description);
  const parameters = parametersOf(description);
  if (!parameters) {
    const resampled = resampledCurves(description).map(fittedCurveFrom);
    return { central, draws: resampled, requested: resampled.length, confidenceLevel };
  }
  const draws: DemandCurve[] = [];
  for (const values of normalParameterDraws(parameters.mean, parameters.covariance, count)) {
    try {
      draws.push(fittedCurveFrom(parameters.with(values)));
    } catch {
      // An invalid parameter draw is left out; `requested` still counts it.
    }
  }
  return { central, draws, requested: count, confidenceLevel };
}
