import { EstimationError } from '../estimation-error';
import { checkLevels, normaliseTargets } from './target-shares';

export interface PostStratificationSpec {
  /** The stratum (cell) of each respondent. */
  readonly strata: readonly string[];
  /** Population share (or total) of each stratum. */
  readonly targets: Readonly<Record<string, number>>;
  /** Design weights to start from; default 1. */
  readonly baseWeights?: readonly number[];
}

export interface PostStratificationResult {
  readonly n: number;
  /** One weight per respondent, scaled to sum to n. */
  readonly weights: number[];
  /** The adjustment factor of each stratum (the weight itself when base weights are 1). */
  readonly cellFactors: Record<string, number>;
  readonly assumptions: string[];
}

/**
 * Post-stratification (Kish 1965): each stratum's weights are scaled so its weighted share equals
 * its population share; weights then sum to the sample size.
 */
export function postStratify(spec: PostStratificationSpec): PostStratificationResult {
  const { strata } = spec;
  const n = strata.length;
  if (n === 0)
    throw new EstimationError(
      'too-few-observations',
      'there are no respondents to weight',
      'stratum',
    );
  const base = spec.baseWeights ?? strata.map(() => 1);
  if (base.length !== n || base.some((w) => !(Number.isFinite(w) && w > 0))) {
    throw new EstimationError(
      'invalid-value',
      'base weights must be one number > 0 per respondent',
      'weight',
    );
  }
  const targets = normaliseTargets(spec.targets, 'stratum');
  checkLevels(strata, targets, 'stratum');
  const total = base.reduce((s, w) => s + w, 0);
  const cellTotals = new Map<string, number>();
  strata.forEach((s, i) => cellTotals.set(s, (cellTotals.get(s) ?? 0) + base[i]));
  const cellFactors: Record<string, number> = {};
  for (const [stratum, sampleTotal] of cellTotals) {
    cellFactors[stratum] = ((targets.get(stratum) ?? 0) * total) / sampleTotal;
  }
  const scale = n / total;
  return {
    n,
    weights: strata.map((s, i) => base[i] * cellFactors[s] * scale),
    cellFactors,
    assumptions: [
      'population shares of the strata are known exactly',
      'weights scaled to sum to the sample size',
    ],
  };
}
