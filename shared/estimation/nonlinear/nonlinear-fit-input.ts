import { EstimationError } from '../estimation-error';
import type { NonlinearFitSpec, NonlinearModel } from './nonlinear-least-squares';

/** Refuses mismatched lengths, a wrong-length start, too few observations and non-finite values. */
export function validateNonlinearFit(spec: NonlinearFitSpec): void {
  const p = spec.model.parameterNames.length;
  if (spec.x.length !== spec.y.length) {
    throw new EstimationError(
      'length-mismatch',
      `x has ${spec.x.length} values, y ${spec.y.length}`,
      'y',
    );
  }
  if (spec.start.length !== p) {
    throw new EstimationError(
      'invalid-value',
      `start needs ${p} values, got ${spec.start.length}`,
      'start',
    );
  }
  if (spec.x.length <= p) {
    throw new EstimationError(
      'too-few-observations',
      `need more than ${p} observations for ${p} parameters, got ${spec.x.length}`,
      'y',
    );
  }
  for (const [field, values] of [
    ['x', spec.x],
    ['y', spec.y],
    ['start', spec.start],
  ] as const) {
    const bad = values.findIndex((v) => !Number.isFinite(v));
    if (bad >= 0) {
      throw new EstimationError(
        'invalid-value',
        `${field}[${bad + 1}] is not a finite number`,
        field,
      );
    }
  }
}

/** ∂f/∂θ by central differences, step ∛ε·|θⱼ| (balances truncation and rounding). */
export function centralDifferenceGradient(
  model: NonlinearModel,
  params: readonly number[],
  x: number,
): number[] {
  return params.map((pj, j) => {
    const h = Math.cbrt(Number.EPSILON) * Math.max(Math.abs(pj), 1e-8);
    const up = [...params];
    const down = [...params];
    up[j] = pj + h;
    down[j] = pj - h;
    return (model.value(up, x) - model.value(down, x)) / (2 * h);
  });
}
