import { tQuantile } from '../distributions/student-t';
import { EstimationError } from '../estimation-error';
import type { Elasticity } from './demand-fit';
import type { DemandDesign, DemandTerm } from './demand-design';
import type { EvaluationPoint } from './demand-model-spec';
import type { LinearFit } from './linear-fit';
import type { NamedColumn } from './named-column';
import { INTERCEPT_TERM } from './weighted-design';

/**
 * Elasticities ∂ln q/∂ln x of every continuous regressor. With ln q and ln x it is the
 * coefficient; with ln q and x it is β·x₀; with q and x it is β·x₀/q₀ (and β/q₀ with ln x).
 * x₀ is the stated value or the (weighted) mean; q₀ is the stated quantity (held fixed) or the
 * prediction at the evaluation point, whose uncertainty the delta method then includes:
 * Var ε = ∇εᵀ·V·∇ε with V the coefficient covariance of the fit.
 */
export function demandElasticities(
  design: DemandDesign,
  fit: LinearFit,
  weights: NamedColumn | undefined,
  at: EvaluationPoint = {},
): Elasticity[] {
  const beta = fit.coefficients.map((row) => row.estimate);
  const point = evaluationRow(design, fit, weights, at);
  const predicted = point.reduce((sum, a, j) => sum + a * beta[j], 0);
  const quantity = design.responseLogged ? null : (at.quantity ?? predicted);
  if (quantity !== null && !(quantity > 0)) {
    throw new EstimationError(
      'non-positive-quantity',
      `the quantity at the evaluation point is ${quantity}; an elasticity needs a positive quantity`,
      'quantity',
    );
  }
  const critical = tQuantile(1 - (1 - fit.confidenceLevel) / 2, fit.standardErrors.df);
  return design.terms
    .filter((term) => term.kind !== 'fixed-effect')
    .map((term) => {
      const j = fit.coefficients.findIndex((row) => row.term === term.name);
      const x0 = valueAt(term, weights, at);
      const factor = term.logged ? 1 : x0;
      const gradient = point.map((a, m) => (m === j ? factor : 0));
      let estimate = factor * beta[j];
      if (quantity !== null) {
        estimate /= quantity;
        const free = at.quantity === undefined;
        gradient.forEach(
          (g, m) => (gradient[m] = g / quantity - (free ? (estimate / quantity) * point[m] : 0)),
        );
      }
      const stdError = Math.sqrt(quadraticForm(fit.covariance, gradient));
      return {
        term: term.name,
        kind: term.kind as Elasticity['kind'],
        estimate,
        stdError,
        ciLow: estimate - critical * stdError,
        ciHigh: estimate + critical * stdError,
        atValue: design.responseLogged && term.logged ? null : x0,
        atQuantity: quantity,
        method: design.responseLogged && term.logged ? 'coefficient' : 'delta',
      };
    });
}

/** The design row (transformed, intercept first) at the evaluation point. */
function evaluationRow(
  design: DemandDesign,
  fit: LinearFit,
  weights: NamedColumn | undefined,
  at: EvaluationPoint,
): number[] {
  return fit.coefficients.map((row) => {
    if (row.term === INTERCEPT_TERM) return 1;
    const term = design.terms.find((t) => t.name === row.term)!;
    const x0 = valueAt(term, weights, at);
    if (!term.logged) return x0;
    if (!(x0 > 0)) {
      throw new EstimationError(
        'non-positive-log',
        `the evaluation value ${x0} of ${term.name} is not positive, so it has no logarithm`,
        term.name,
      );
    }
    return Math.log(x0);
  });
}

function valueAt(term: DemandTerm, weights: NamedColumn | undefined, at: EvaluationPoint): number {
  const stated = term.kind === 'own-price' ? at.price : at.covariates?.[term.name];
  if (stated !== undefined) return stated;
  let sum = 0;
  let total = 0;
  term.raw.forEach((value, i) => {
    const w = weights ? weights.values[i] : 1;
    sum += w * value;
    total += w;
  });
  return sum / total;
}

function quadraticForm(matrix: readonly (readonly number[])[], v: readonly number[]): number {
  return v.reduce((sum, a, i) => sum + a * matrix[i].reduce((s, m, j) => s + m * v[j], 0), 0);
}
