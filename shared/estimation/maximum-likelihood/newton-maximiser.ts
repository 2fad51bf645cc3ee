import { EstimationError } from '../estimation-error';
import { invertPositiveDefinite, multiplyMatrixVector } from './small-matrix';
import { largest } from '../numerics/extent';

/** A log-likelihood with its gradient and Hessian at one parameter vector. */
export interface LogLikelihoodPoint {
  readonly value: number;
  readonly gradient: number[];
  readonly hessian: number[][];
}

export interface NewtonResult {
  readonly params: number[];
  readonly logLikelihood: number;
  /** (−Hessian)⁻¹ at the maximum: the model-based covariance. */
  readonly inverseInformation: number[][];
  readonly hessian: number[][];
  readonly iterations: number;
}

/**
 * Newton–Raphson ascent for a concave log-likelihood, with step halving so the likelihood never
 * falls, and a ridge on the Hessian where it is not negative definite. Stops when the Newton
 * decrement gᵀ(−H)⁻¹g is below 1e-20·max(1, |ℓ|); throws 'not-converged' otherwise.
 */
export function maximiseLogLikelihood(
  evaluate: (params: readonly number[]) => LogLikelihoodPoint,
  start: readonly number[],
  field: string,
  maxIterations = 200,
): NewtonResult {
  let params = [...start];
  let point = evaluate(params);
  if (!Number.isFinite(point.value)) {
    throw new EstimationError(
      'invalid-value',
      'the log-likelihood is not finite at the start',
      field,
    );
  }
  for (let iteration = 0; iteration <= maxIterations; iteration++) {
    const { step, inverse } = newtonStep(point);
    const decrement = step.reduce((s, d, j) => s + d * point.gradient[j], 0);
    const scale = Math.max(1, Math.abs(point.value));
    const done = (): NewtonResult => ({
      params,
      logLikelihood: point.value,
      inverseInformation: inverse.matrix,
      hessian: point.hessian,
      iterations: iteration,
    });
    if (decrement <= 1e-20 * scale && inverse.exact) return done();
    // The gain a Newton step promises (decrement/2) is then below the rounding noise of ℓ, so a
    // comparison of likelihoods cannot confirm it: without this the search can keep rejecting
    // the full step to the maximum and creep about it by half steps until it gives up.
    if (decrement <= 1e-12 * scale && inverse.exact) {
      const trial = params.map((p, j) => p + step[j]);
      const landed = evaluate(trial);
      if (Number.isFinite(landed.value)) {
        params = trial;
        point = landed;
        continue;
      }
    }
    const next = halveUntilBetter(evaluate, params, step, point.value);
    // No improving step left: at the maximum up to rounding, or stuck.
    if (!next) {
      if (decrement <= 1e-10 * scale && inverse.exact) return done();
      break;
    }
    params = next.params;
    point = next.point;
  }
  throw new EstimationError(
    'not-converged',
    'the maximum-likelihood iteration did not converge (the estimate may not exist for these data)',
    field,
  );
}

function newtonStep(point: LogLikelihoodPoint): {
  step: number[];
  inverse: { matrix: number[][]; exact: boolean };
} {
  const negH = point.hessian.map((row) => row.map((v) => -v));
  const exact = invertPositiveDefinite(negH);
  if (exact)
    return {
      step: multiplyMatrixVector(exact, point.gradient),
      inverse: { matrix: exact, exact: true },
    };
  const scale = Math.max(largest(negH.map((row, i) => Math.abs(row[i]))), 1e-12);
  for (let ridge = 1e-8 * scale; ridge < 1e12 * scale; ridge *= 10) {
    const damped = invertPositiveDefinite(
      negH.map((row, i) => row.map((v, j) => (i === j ? v + ridge : v))),
    );
    if (damped)
      return {
        step: multiplyMatrixVector(damped, point.gradient),
        inverse: { matrix: damped, exact: false },
      };
  }
  return { step: point.gradient.map(() => 0), inverse: { matrix: negH, exact: false } };
}

function halveUntilBetter(
  evaluate: (params: readonly number[]) => LogLikelihoodPoint,
  params: readonly number[],
  step: readonly number[],
  value: number,
): { params: number[]; point: LogLikelihoodPoint } | undefined {
  for (let factor = 1; factor > 1e-12; factor /= 2) {
    const trial = params.map((p, j) => p + factor * step[j]);
    const point = evaluate(trial);
    if (Number.isFinite(point.value) && point.value >= value) return { params: trial, point };
  }
  return undefined;
}
