import { tQuantile } from '../distributions/student-t';
import { EstimationError } from '../estimation-error';
import { householderLeastSquares } from './householder-least-squares';
import { centralDifferenceGradient, validateNonlinearFit } from './nonlinear-fit-input';
import { levenbergMarquardt, type LevenbergMarquardtOptions } from './levenberg-marquardt';

/** A model y = f(x; θ) with its analytic gradient ∂f/∂θ (numeric central differences if absent). */
export interface NonlinearModel {
  readonly parameterNames: readonly string[];
  value(params: readonly number[], x: number): number;
  gradient?(params: readonly number[], x: number): number[];
}

export interface NonlinearFitSpec extends LevenbergMarquardtOptions {
  readonly model: NonlinearModel;
  readonly x: readonly number[];
  readonly y: readonly number[];
  readonly start: readonly number[];
  /** Confidence level of the t intervals; default 0.95. */
  readonly confidenceLevel?: number;
}

export interface NonlinearCoefficient {
  readonly term: string;
  readonly estimate: number;
  readonly stdError: number;
  readonly ciLow: number;
  readonly ciHigh: number;
}

export interface NonlinearFit {
  readonly n: number;
  readonly coefficients: NonlinearCoefficient[];
  /** s²(JᵀJ)⁻¹ at the solution, in the order of `parameterNames`. */
  readonly covariance: number[][];
  readonly rss: number;
  readonly residualSD: number;
  readonly dfResidual: number;
  readonly iterations: number;
  readonly assumptions: string[];
}

/**
 * Nonlinear least squares by Levenberg–Marquardt, standard errors from s²(JᵀJ)⁻¹ at the solution
 * (computed through the QR factor of J), t-based intervals with n − p degrees of freedom.
 * Throws 'not-converged' rather than return an unconverged estimate.
 */
export function fitNonlinearLeastSquares(spec: NonlinearFitSpec): NonlinearFit {
  const { model, x, y, start } = spec;
  validateNonlinearFit(spec);
  const gradient =
    model.gradient?.bind(model) ??
    ((t: readonly number[], xi: number) => centralDifferenceGradient(model, t, xi));
  const result = levenbergMarquardt(
    {
      y,
      predict: (t) => x.map((xi) => model.value(t, xi)),
      jacobian: (t) => x.map((xi) => gradient(t, xi)),
    },
    start,
    spec,
  );
  if (!result.converged || !result.params.every(Number.isFinite)) {
    throw new EstimationError(
      'not-converged',
      `nonlinear least squares did not converge in ${result.iterations} iterations; try another start`,
      'start',
    );
  }
  const dfResidual = x.length - model.parameterNames.length;
  const s2 = result.rss / dfResidual;
  const covariance = scaledInverseCrossProduct(result.jacobian, s2, model.parameterNames);
  const t = tQuantile(1 - (1 - (spec.confidenceLevel ?? 0.95)) / 2, dfResidual);
  return {
    n: x.length,
    coefficients: model.parameterNames.map((term, j) => {
      const estimate = result.params[j];
      const stdError = Math.sqrt(covariance[j][j]);
      return {
        term,
        estimate,
        stdError,
        ciLow: estimate - t * stdError,
        ciHigh: estimate + t * stdError,
      };
    }),
    covariance,
    rss: result.rss,
    residualSD: Math.sqrt(s2),
    dfResidual,
    iterations: result.iterations,
    assumptions: [
      'independent errors with constant variance',
      'standard errors from s²(JᵀJ)⁻¹ at the solution (linearisation); intervals t-based with n − p df',
      model.gradient ? 'analytic Jacobian' : 'Jacobian by central differences',
    ],
  };
}

/** s²·(JᵀJ)⁻¹ = s²·R⁻¹R⁻ᵀ from the QR factor of J. */
function scaledInverseCrossProduct(
  jacobian: readonly (readonly number[])[],
  s2: number,
  names: readonly string[],
): number[][] {
  const { rInverse } = householderLeastSquares(jacobian, new Array(jacobian.length).fill(0), names);
  return rInverse.map((rowI) =>
    rInverse.map((rowJ) => s2 * rowI.reduce((s, v, k) => s + v * rowJ[k], 0)),
  );
}
