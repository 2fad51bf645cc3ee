import { normalQuantile } from '../distributions/normal';
import { quadraticForm } from './small-matrix';

/** A derived estimate with its standard error and a normal (Wald) interval. */
export interface IntervalEstimate {
  readonly estimate: number;
  readonly stdError: number;
  readonly ciLow: number;
  readonly ciHigh: number;
}

/**
 * Delta method: the standard error of g(θ̂) is √(∇gᵀ·V·∇g), with V the covariance of θ̂; the
 * interval is estimate ± z·SE at the given confidence level.
 */
export function deltaMethod(
  estimate: number,
  gradient: readonly number[],
  covariance: readonly (readonly number[])[],
  confidenceLevel: number,
): IntervalEstimate {
  const stdError = Math.sqrt(Math.max(0, quadraticForm(covariance, gradient)));
  const z = normalQuantile(1 - (1 - confidenceLevel) / 2);
  return { estimate, stdError, ciLow: estimate - z * stdError, ciHigh: estimate + z * stdError };
}
