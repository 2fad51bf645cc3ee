import type { CurveDescription } from '@shared/analysis/curve-description';

/**
 * The textbook demand Q = 100 − 2P (CHECKS.md §8) as a fit result would describe it, with a
 * small covariance so simulated intervals are narrow but not empty.
 */
export function linearDescription(
  covariance: number[][] = [
    [4, -0.15],
    [-0.15, 0.01],
  ],
): Extract<CurveDescription, { kind: 'linear' }> {
  return {
    kind: 'linear',
    intercept: 100,
    priceCoefficient: -2,
    covariance,
    dfResidual: 48,
    observedPriceRange: { min: 10, max: 30 },
    n: 50,
  };
}

export const zeroCovariance = [
  [0, 0],
  [0, 0],
];
