import { EstimationError } from '../estimation-error';
import { logistic } from '../maximum-likelihood/binomial-logit';
import type { DemandCurve, PriceRange } from './demand-curve';
import { formulaNumber, formulaTerm } from '../formula-number';

/** Linear demand Q = intercept − slope·P, clipped at 0 above the choke price intercept/slope. */
export function linearDemand(intercept: number, slope: number): DemandCurve {
  if (!(slope > 0) || !(intercept > 0)) {
    throw new EstimationError(
      'invalid-value',
      'linear demand needs intercept > 0 and slope > 0',
      'slope',
    );
  }
  const choke = intercept / slope;
  return {
    description: `Q = ${formulaNumber(intercept)} − ${formulaNumber(slope)}·P`,
    quantity: (p) => Math.max(0, intercept - slope * p),
    slope: (p) => (p < choke ? -slope : 0),
    priceRange: { min: 0, max: choke },
    closedForm: { kind: 'linear', intercept, slope },
  };
}

/** Constant-elasticity demand Q = scale·P^elasticity (log-log form). */
export function constantElasticityDemand(
  scale: number,
  elasticity: number,
  range?: PriceRange,
): DemandCurve {
  if (!(scale > 0) || !Number.isFinite(elasticity)) {
    throw new EstimationError(
      'invalid-value',
      'constant-elasticity demand needs scale > 0',
      'scale',
    );
  }
  return {
    description: `Q = ${formulaNumber(scale)}·P^${formulaNumber(elasticity)}`,
    quantity: (p) => scale * p ** elasticity,
    slope: (p) => scale * elasticity * p ** (elasticity - 1),
    priceRange: range,
    closedForm: { kind: 'constant-elasticity', scale, elasticity },
  };
}

/**
 * Logistic purchase share s(P) = 1/(1 + e^−(a + b·P)), times `marketSize` for a quantity
 * (1 leaves it a share).
 */
export function logisticShareDemand(
  a: number,
  b: number,
  range: PriceRange,
  marketSize = 1,
): DemandCurve {
  return {
    description: `share = 1/(1 + exp(−(${formulaNumber(a)} ${formulaTerm(b)}·P)))`,
    quantity: (p) => marketSize * logistic(a + b * p),
    slope: (p) => {
      const s = logistic(a + b * p);
      return marketSize * b * s * (1 - s);
    },
    priceRange: range,
  };
}
