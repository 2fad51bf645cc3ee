import { normalQuantile } from '../distributions/normal';
import { EstimationError } from '../estimation-error';

export interface SampleSizeSpec {
  /** Half-width of the interval for the proportion, e.g. 0.05. */
  readonly marginOfError: number;
  /** Expected proportion; default 0.5 (the most conservative). */
  readonly proportion?: number;
  /** Default 0.95. */
  readonly confidenceLevel?: number;
  /** Population size N for the finite-population correction. */
  readonly populationSize?: number;
  /** 'cochran' (default): n₀/(1 + (n₀ − 1)/N); 'simple': n₀/(1 + n₀/N). */
  readonly correction?: 'cochran' | 'simple';
}

export interface SampleSize {
  /** z²p(1 − p)/e², before rounding. */
  readonly n0: number;
  /** After the finite-population correction (n₀ when no N), before rounding. */
  readonly nAdjusted: number;
  /** nAdjusted rounded up. */
  readonly n: number;
  readonly z: number;
  readonly assumptions: string[];
}

/** Sample size to estimate a proportion within a margin of error (Cochran 1977). */
export function sampleSizeForProportion(spec: SampleSizeSpec): SampleSize {
  const { marginOfError: e, populationSize: big } = spec;
  const p = spec.proportion ?? 0.5;
  const level = spec.confidenceLevel ?? 0.95;
  if (!(e > 0 && e < 1))
    throw new EstimationError(
      'invalid-value',
      'margin of error must lie in (0, 1)',
      'marginOfError',
    );
  if (!(p > 0 && p < 1))
    throw new EstimationError('invalid-value', 'proportion must lie in (0, 1)', 'proportion');
  if (!(level > 0 && level < 1))
    throw new EstimationError(
      'invalid-value',
      'confidence level must lie in (0, 1)',
      'confidenceLevel',
    );
  if (big !== undefined && !(Number.isInteger(big) && big > 0)) {
    throw new EstimationError(
      'invalid-value',
      'population size must be a whole number > 0',
      'populationSize',
    );
  }
  const z = normalQuantile(1 - (1 - level) / 2);
  const n0 = (z * z * p * (1 - p)) / (e * e);
  const simple = spec.correction === 'simple';
  const nAdjusted =
    big === undefined ? n0 : simple ? n0 / (1 + n0 / big) : n0 / (1 + (n0 - 1) / big);
  return {
    n0,
    nAdjusted,
    // A hair below an integer is rounding noise, not a reason to add a respondent.
    n: Math.ceil(nAdjusted - 1e-9),
    z,
    assumptions: [
      'simple random sampling; normal approximation to the sample proportion',
      big === undefined
        ? 'no finite-population correction'
        : `finite-population correction (${simple ? 'n₀/(1 + n₀/N)' : 'n₀/(1 + (n₀ − 1)/N)'})`,
    ],
  };
}
