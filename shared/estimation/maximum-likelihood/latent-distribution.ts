import { normalCdf } from '../distributions/normal';
import { logistic } from './binomial-logit';

/** A symmetric standard distribution for a latent willingness to pay: F, its density f and f′. */
export interface LatentDistribution {
  readonly name: 'logistic' | 'normal';
  cdf(z: number): number;
  density(z: number): number;
  densitySlope(z: number): number;
}

export const logisticDistribution: LatentDistribution = {
  name: 'logistic',
  cdf: logistic,
  density: (z) => {
    const p = logistic(z);
    return p * (1 - p);
  },
  densitySlope: (z) => {
    const p = logistic(z);
    return p * (1 - p) * (1 - 2 * p);
  },
};

const standardNormalDensity = (z: number): number =>
  Math.exp(-0.5 * z * z) / Math.sqrt(2 * Math.PI);

export const normalDistribution: LatentDistribution = {
  name: 'normal',
  cdf: normalCdf,
  density: standardNormalDensity,
  densitySlope: (z) => -z * standardNormalDensity(z),
};
