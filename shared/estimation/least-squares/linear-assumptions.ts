import type { WeightedDesign } from './weighted-design';

/** The assumptions a least-squares fit rests on, in words, for the report. */
export function linearAssumptions(
  design: WeightedDesign,
  seType: string,
  instrumental: boolean,
): string[] {
  const notes = [
    instrumental
      ? 'two-stage least squares: the instruments are uncorrelated with the error and shift the ' +
        'endogenous regressors (a first-stage F below about 10 signals weak instruments, common practice)'
      : 'errors have mean zero given the regressors (the regressors are exogenous)',
    design.rootWeights
      ? 'weighted least squares: observation i counts with weight wᵢ (analytic weights)'
      : 'ordinary least squares: every observation counts equally',
  ];
  if (seType === 'classical')
    notes.push('classical standard errors assume independent errors of equal variance');
  if (seType === 'hc1')
    notes.push('HC1 standard errors: independent errors of any variance, sandwich × n/(n − k)');
  if (seType === 'cluster') {
    notes.push(
      'cluster-robust standard errors: errors independent across clusters, any correlation within; ' +
        'sandwich × G/(G − 1)·(n − 1)/(n − k), t intervals on G − 1 df',
    );
  }
  if (instrumental) {
    notes.push(
      'standard errors use the structural residuals y − Xβ; R² may be negative under 2SLS',
    );
  }
  if (!design.intercept) notes.push('no intercept: R² is uncentred (1 − RSS/Σy²)');
  return notes;
}
