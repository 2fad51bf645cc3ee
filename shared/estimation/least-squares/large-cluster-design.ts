import { mulberry32 } from '../random/mulberry32';
import type { LinearModelSpec } from './fit-linear-model';

/**
 * A seeded design of `n` rows and eight uniform regressors, y = 1 + Σ j·x_j + U(0,1) noise, in
 * 40 sites; the cluster-robust fit of it is used by a spec (behaviour) and the bench (speed).
 */
export function largeClusterDesign(n: number): LinearModelSpec {
  const next = mulberry32(99);
  const regressors = Array.from({ length: 8 }, (_, j) => ({
    name: `x${j}`,
    values: Array.from({ length: n }, () => next()),
  }));
  const y = Array.from(
    { length: n },
    (_, i) => regressors.reduce((s, c, j) => s + j * c.values[i], 1) + next(),
  );
  const sites = Array.from({ length: n }, (_, i) => `site${i % 40}`);
  return {
    response: { name: 'y', values: y },
    regressors,
    standardErrors: { type: 'cluster', clusters: { name: 'site', values: sites } },
  };
}
