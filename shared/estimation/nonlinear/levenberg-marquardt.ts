import { householderLeastSquares } from './householder-least-squares';
import { largest } from '../numerics/extent';

/** What the iteration needs from a least-squares problem: predictions and their Jacobian. */
export interface LeastSquaresProblem {
  readonly y: readonly number[];
  predict(params: readonly number[]): number[];
  /** ∂prediction_i/∂param_j, rows = observations. */
  jacobian(params: readonly number[]): number[][];
}

/** Tolerances of the iteration; the defaults are tight on purpose (loose ones stop early). */
export interface LevenbergMarquardtOptions {
  readonly maxIterations?: number;
  /** Converged when the scaled step is this small relative to the scaled parameters. */
  readonly stepTolerance?: number;
  /** Converged when every Jacobian column is this close to orthogonal to the residuals. */
  readonly gradientTolerance?: number;
}

export interface LevenbergMarquardtResult {
  readonly params: number[];
  readonly rss: number;
  readonly iterations: number;
  readonly converged: boolean;
  readonly jacobian: number[][];
}

const sumOfSquares = (v: readonly number[]): number => v.reduce((s, x) => s + x * x, 0);
const euclideanNorm = (v: readonly number[]): number => Math.sqrt(sumOfSquares(v));
const residualsOf = (y: readonly number[], f: readonly number[]): number[] =>
  y.map((yi, i) => yi - f[i]);

/**
 * Levenberg–Marquardt with Marquardt's diagonal scaling (running maximum of the Jacobian column
 * norms, after Moré 1978), each damped step solved by QR of the augmented system [J; √λ·D].
 * Scaling matters for badly scaled parameters (one of order 1e2, another 1e-4).
 */
export function levenbergMarquardt(
  problem: LeastSquaresProblem,
  start: readonly number[],
  options: LevenbergMarquardtOptions = {},
): LevenbergMarquardtResult {
  const maxIterations = options.maxIterations ?? 2000;
  const stepTol = options.stepTolerance ?? 1e-13;
  const gradTol = options.gradientTolerance ?? 1e-11;
  let params = [...start];
  let residuals = residualsOf(problem.y, problem.predict(params));
  let rss = sumOfSquares(residuals);
  let jac = problem.jacobian(params);
  const diag = columnNorms(jac).map((d) => (d > 0 ? d : 1));
  let lambda = 1e-3;
  for (let iteration = 1; iteration <= maxIterations; iteration++) {
    if (rss === 0 || maxGradientCosine(jac, residuals) <= gradTol) {
      return { params, rss, iterations: iteration - 1, converged: true, jacobian: jac };
    }
    columnNorms(jac).forEach((d, j) => (diag[j] = Math.max(diag[j], d)));
    const step = dampedStep(problem, params, residuals, jac, diag, lambda, rss);
    if (!step) return { params, rss, iterations: iteration, converged: false, jacobian: jac };
    lambda = step.lambda;
    params = step.params;
    residuals = step.residuals;
    rss = step.rss;
    jac = problem.jacobian(params);
    if (step.scaledStep <= stepTol * (step.scaledParams + stepTol)) {
      return { params, rss, iterations: iteration, converged: true, jacobian: jac };
    }
  }
  return { params, rss, iterations: maxIterations, converged: false, jacobian: jac };
}

interface AcceptedStep {
  params: number[];
  residuals: number[];
  rss: number;
  lambda: number;
  scaledStep: number;
  scaledParams: number;
}

/** Raises the damping until a step lowers the residual sum of squares; undefined if none does. */
function dampedStep(
  problem: LeastSquaresProblem,
  params: readonly number[],
  residuals: readonly number[],
  jac: readonly number[][],
  diag: readonly number[],
  startLambda: number,
  rss: number,
): AcceptedStep | undefined {
  for (let lambda = startLambda; lambda < 1e20; lambda *= 10) {
    const root = Math.sqrt(lambda);
    const rows = [...jac, ...diag.map((d, j) => diag.map((_, k) => (k === j ? root * d : 0)))];
    const rhs = [...residuals, ...diag.map(() => 0)];
    const delta = householderLeastSquares(rows, rhs).solution;
    const trial = params.map((p, j) => p + delta[j]);
    const trialResiduals = residualsOf(problem.y, problem.predict(trial));
    const trialRss = sumOfSquares(trialResiduals);
    if (Number.isFinite(trialRss) && trialRss <= rss) {
      return {
        params: trial,
        residuals: trialResiduals,
        rss: trialRss,
        lambda: Math.max(lambda / 10, 1e-15),
        scaledStep: euclideanNorm(delta.map((d, j) => d * diag[j])),
        scaledParams: euclideanNorm(params.map((p, j) => p * diag[j])),
      };
    }
  }
  return undefined;
}

function columnNorms(jac: readonly number[][]): number[] {
  return (jac[0] ?? []).map((_, j) => euclideanNorm(jac.map((row) => row[j])));
}

function maxGradientCosine(jac: readonly number[][], residuals: readonly number[]): number {
  const rNorm = euclideanNorm(residuals);
  return largest(
    columnNorms(jac).map((norm, j) => {
      const dot = jac.reduce((s, row, i) => s + row[j] * residuals[i], 0);
      return norm === 0 ? 0 : Math.abs(dot) / (norm * rNorm);
    }),
  );
}
