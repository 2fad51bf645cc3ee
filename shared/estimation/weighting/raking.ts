import { EstimationError } from '../estimation-error';
import { checkLevels, normaliseTargets } from './target-shares';

export interface RakingSpec {
  /** Per variable, the level of each respondent (all arrays of the sample's length). */
  readonly variables: Readonly<Record<string, readonly string[]>>;
  /** Per variable, the population share (or total) of each level. */
  readonly targets: Readonly<Record<string, Readonly<Record<string, number>>>>;
  readonly baseWeights?: readonly number[];
  /**
   * Respondents each entry stands for (default 1): raking a cross-tabulation of the levels, one
   * entry per cell, gives every respondent of a cell the cell's weight.
   */
  readonly counts?: readonly number[];
  /** Default 100 sweeps. */
  readonly maxIterations?: number;
  /** Largest allowed |weighted share − target share| over all margins; default 1e-12. */
  readonly tolerance?: number;
}

export interface RakingResult {
  readonly n: number;
  /** One weight per respondent, scaled to sum to n. */
  readonly weights: number[];
  readonly iterations: number;
  readonly maxMarginError: number;
  readonly assumptions: string[];
}

/**
 * Raking (iterative proportional fitting; Deming & Stephan 1940): each sweep scales the weights to
 * every variable's margins in turn, until every margin is within tolerance. Throws 'not-converged'
 * with the iterations run and the remaining margin error when the margins cannot all be met.
 */
export function rake(spec: RakingSpec): RakingResult {
  const names = Object.keys(spec.targets);
  const n = names.length ? (spec.variables[names[0]]?.length ?? 0) : 0;
  if (n === 0)
    throw new EstimationError(
      'too-few-observations',
      'there are no respondents or no margins to rake to',
      'targets',
    );
  const margins = names.map((name) => {
    const levels = spec.variables[name];
    if (!levels || levels.length !== n) {
      throw new EstimationError(
        'missing-column',
        `variable ${name} is missing or has the wrong length`,
        name,
      );
    }
    const targets = normaliseTargets(spec.targets[name], name);
    checkLevels(levels, targets, name);
    return { levels, targets };
  });
  const weights = [...(spec.baseWeights ?? new Array<number>(n).fill(1))];
  if (weights.length !== n || weights.some((w) => !(Number.isFinite(w) && w > 0))) {
    throw new EstimationError(
      'invalid-value',
      'base weights must be one number > 0 per respondent',
      'weight',
    );
  }
  const counts = spec.counts ?? new Array<number>(n).fill(1);
  if (counts.length !== n || counts.some((c) => !(Number.isInteger(c) && c > 0))) {
    throw new EstimationError('invalid-value', 'counts must be one whole number > 0 per entry', 'count');
  }
  const maxIterations = spec.maxIterations ?? 100;
  const tolerance = spec.tolerance ?? 1e-12;
  let error = marginError(margins, weights, counts);
  let iterations = 0;
  while (error > tolerance && iterations < maxIterations) {
    for (const margin of margins) scaleToMargin(margin, weights, counts);
    iterations++;
    error = marginError(margins, weights, counts);
  }
  if (error > tolerance) {
    throw new EstimationError(
      'not-converged',
      `raking did not converge: largest margin error ${error.toExponential(3)} after ${iterations} sweeps`,
      'targets',
    );
  }
  const total = weights.reduce((s, w, i) => s + w * counts[i], 0);
  const respondents = counts.reduce((s, c) => s + c, 0);
  return {
    n: respondents,
    weights: weights.map((w) => (w * respondents) / total),
    iterations,
    maxMarginError: error,
    assumptions: ['population margins known exactly', 'weights scaled to sum to the sample size'],
  };
}

interface Margin {
  readonly levels: readonly string[];
  readonly targets: Map<string, number>;
}

function weightedShares(
  { levels }: Margin,
  weights: readonly number[],
  counts: readonly number[],
): Map<string, number> {
  const total = weights.reduce((s, w, i) => s + w * counts[i], 0);
  const shares = new Map<string, number>();
  levels.forEach((level, i) =>
    shares.set(level, (shares.get(level) ?? 0) + (weights[i] * counts[i]) / total),
  );
  return shares;
}

function scaleToMargin(margin: Margin, weights: number[], counts: readonly number[]): void {
  const shares = weightedShares(margin, weights, counts);
  margin.levels.forEach(
    (level, i) => (weights[i] *= (margin.targets.get(level) ?? 0) / (shares.get(level) ?? 1)),
  );
}

function marginError(
  margins: readonly Margin[],
  weights: readonly number[],
  counts: readonly number[],
): number {
  let worst = 0;
  for (const margin of margins) {
    const shares = weightedShares(margin, weights, counts);
    for (const [level, target] of margin.targets)
      worst = Math.max(worst, Math.abs((shares.get(level) ?? 0) - target));
  }
  return worst;
}
