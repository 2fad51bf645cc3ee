import { CompensatedSum } from './compensated-dot';
import type { LinearFit } from './linear-fit';
import { waldF } from './wald-test';

type GoodnessOfFit = Pick<
  LinearFit,
  'rSquared' | 'adjustedRSquared' | 'rSquaredKind' | 'fStatistic' | 'fDf' | 'fTest' | 'residualSD'
>;

/** What R², F and the residual SD are computed from. */
export interface FitSummaryInput {
  readonly n: number;
  /** Σw(y − ȳ)² with an intercept, Σwy² without (see totalSumOfSquares). */
  readonly totalSumOfSquares: number;
  readonly intercept: boolean;
  readonly residualSumOfSquares: number;
  readonly estimates: ArrayLike<number>;
  readonly covariance: readonly (readonly number[])[];
  /** 'classical' gives the ANOVA F; otherwise a Wald F on the robust covariance. */
  readonly robust: boolean;
  /** Denominator df of the F test (n − k, or G − 1 for cluster-robust). */
  readonly fDenominatorDf: number;
}

/**
 * R² (centred, weighted when weighted; uncentred 1 − RSS/Σy² without intercept), adjusted R²
 * (1 − (1 − R²)(n − i)/(n − k), i = 1 with an intercept else 0), residual SD √(RSS/(n − k)),
 * and the F test that all non-intercept coefficients are zero.
 */
export function goodnessOfFit(input: FitSummaryInput): GoodnessOfFit {
  const { n, totalSumOfSquares } = input;
  const k = input.estimates.length;
  const rss = input.residualSumOfSquares;
  const rSquared = 1 - rss / totalSumOfSquares;
  const dfModel = input.intercept ? k - 1 : k;
  const adjustedRSquared = 1 - ((1 - rSquared) * (n - (input.intercept ? 1 : 0))) / (n - k);
  const slopes = Array.from({ length: k }, (_, j) => j).slice(input.intercept ? 1 : 0);
  let fStatistic: number | null = null;
  if (dfModel > 0 && !input.robust) {
    fStatistic = (totalSumOfSquares - rss) / dfModel / (rss / (n - k));
  } else if (dfModel > 0 && dfModel <= input.fDenominatorDf) {
    fStatistic = safeWald(input.estimates, input.covariance, slopes);
  }
  return {
    rSquared,
    adjustedRSquared,
    rSquaredKind: input.intercept ? 'centred' : 'uncentred',
    fStatistic: fStatistic !== null && Number.isFinite(fStatistic) ? fStatistic : null,
    fDf:
      fStatistic !== null && Number.isFinite(fStatistic) ? [dfModel, input.fDenominatorDf] : null,
    fTest: input.robust ? 'wald' : 'anova',
    residualSD: Math.sqrt(rss / (n - k)),
  };
}

/**
 * The total sum of squares R² compares the residuals with: about the weighted mean with an
 * intercept, about zero without. `response` is the weighted response √wᵢ·yᵢ.
 */
export function totalSumOfSquares(
  response: Float64Array,
  rootWeights: Float64Array | null,
  intercept: boolean,
): number {
  return intercept ? centredTotal(response, rootWeights) : uncentredTotal(response);
}

function centredTotal(response: Float64Array, w: Float64Array | null): number {
  const numerator = new CompensatedSum();
  const denominator = new CompensatedSum();
  response.forEach((value, i) => {
    numerator.add(w ? value * w[i] : value);
    denominator.add(w ? w[i] * w[i] : 1);
  });
  const mean = numerator.value() / denominator.value();
  const total = new CompensatedSum();
  response.forEach((value, i) => {
    const deviation = value - (w ? w[i] : 1) * mean;
    total.addProduct(deviation, deviation);
  });
  return total.value();
}

function uncentredTotal(response: Float64Array): number {
  const total = new CompensatedSum();
  for (const value of response) total.addProduct(value, value);
  return total.value();
}

function safeWald(
  estimates: ArrayLike<number>,
  covariance: readonly (readonly number[])[],
  indices: number[],
): number | null {
  try {
    return waldF(estimates, covariance, indices);
  } catch {
    return null;
  }
}
