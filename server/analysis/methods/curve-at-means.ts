import type { CurveDescription } from '@shared/analysis/curve-description';
import type { DemandFit } from '@shared/estimation/least-squares/demand-fit';
import type { DemandDesign } from '@shared/estimation/least-squares/demand-design';
import type { NamedColumn } from '@shared/estimation/least-squares/named-column';
import { INTERCEPT_TERM } from '@shared/estimation/least-squares/weighted-design';

/**
 * The fitted demand curve in price alone, with every covariate and fixed-effect dummy held at
 * its (weighted) sample mean: intercept a + Σ βⱼ·x̄ⱼ and its covariance with the price
 * coefficient, L·V·Lᵀ with L = [[1, 0, x̄…], [0, 1, 0…]]. Null (with the reason) when the
 * curve does not fall with price or a linear curve has no positive quantity.
 */
export function curveAtMeans(
  fit: DemandFit,
  design: DemandDesign,
  weights: NamedColumn | undefined,
  priceName: string,
  observedPriceRange: { min: number; max: number },
): { curve: CurveDescription | null; reason: string | null } {
  const w = weights?.values ?? design.response.values.map(() => 1);
  const total = w.reduce((s, v) => s + v, 0);
  const mean = (values: readonly number[]) => values.reduce((s, v, i) => s + v * w[i], 0) / total;
  const means = new Map(design.regressors.map((column) => [column.name, mean(column.values)]));
  const terms = fit.coefficients.map((row) => row.term);
  const lift = terms.map((term) =>
    term === INTERCEPT_TERM ? 1 : term === priceName ? 0 : (means.get(term) ?? 0),
  );
  const pick = terms.map((term) => (term === priceName ? 1 : 0));
  const beta = fit.coefficients.map((row) => row.estimate);
  const dot = (a: number[], b: number[]) => a.reduce((s, v, i) => s + v * b[i], 0);
  const times = (row: number[]) => fit.covariance.map((line) => dot(line, row));
  const covariance = [
    [dot(lift, times(lift)), dot(lift, times(pick))],
    [dot(pick, times(lift)), dot(pick, times(pick))],
  ];
  const intercept = dot(lift, beta);
  const priceCoefficient = dot(pick, beta);
  if (!(priceCoefficient < 0)) {
    return {
      curve: null,
      reason: `the fitted demand does not fall with price (price coefficient ${priceCoefficient})`,
    };
  }
  if (fit.form === 'linear' && !(intercept > 0)) {
    return {
      curve: null,
      reason: 'the fitted linear demand has no positive quantity at any price',
    };
  }
  return {
    curve: {
      kind: fit.form,
      intercept,
      priceCoefficient,
      covariance,
      dfResidual: fit.standardErrors.df,
      observedPriceRange,
      n: fit.n,
    },
    reason: null,
  };
}
