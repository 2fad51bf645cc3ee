import { multiplePrecisionLogit } from '../../../tests/fixtures/near-collinear/multiple-precision-logit';
import { logRelativeError } from '../../../tests/fixtures/strd/load-strd-set';
import { gaussian } from '../random/gaussian';
import { mulberry32 } from '../random/mulberry32';
import { fitBinomialLogit } from './binomial-logit';

// Expected values: the same logit maximised and its sandwich formed in 50-digit decimal
// arithmetic in the test (decimal.js); see multiple-precision-logit.ts.
const REQUIRED_DIGITS = 9;

/**
 * Invented price-ladder answers: 40 respondents asked at 8 prices from `base` up in steps of
 * `step`, calibrated purchase probabilities with a respondent effect, respondent weights.
 * Prices far from zero relative to their spread make [1, price] ill-conditioned.
 */
function ladderAnswers(seed: number, base: number, step: number) {
  const uniform = mulberry32(seed);
  const normal = gaussian(uniform);
  const x: number[] = [];
  const y: number[] = [];
  const weights: number[] = [];
  const clusters: string[] = [];
  for (let r = 0; r < 40; r++) {
    const effect = 0.6 * normal();
    const weight = 0.5 + 2 * uniform();
    for (let s = 0; s < 8; s++) {
      const price = base + step * s;
      const eta = 1.5 - (3 * s) / 7 + effect + 0.3 * normal();
      x.push(price);
      y.push(Math.min(0.98, Math.max(0.02, 1 / (1 + Math.exp(-eta)))));
      weights.push(weight);
      clusters.push(`respondent ${r}`);
    }
  }
  return { x, y, weights, clusters };
}

describe('the ladder logit’s respondent-clustered errors against 50-digit arithmetic', () => {
  it.each([
    { seed: 5, base: 2, step: 0.5 },
    { seed: 6, base: 95, step: 0.5 },
    { seed: 7, base: 4990, step: 1.5 },
  ])('prices from $base in steps of $step', ({ seed, base, step }) => {
    const data = ladderAnswers(seed, base, step);
    const fit = fitBinomialLogit(data, 'price');
    const reference = multiplePrecisionLogit(data, [fit.intercept, fit.slope]);
    const digits = {
      intercept: logRelativeError(fit.intercept, reference.intercept),
      slope: logRelativeError(fit.slope, reference.slope),
      interceptError: logRelativeError(
        Math.sqrt(fit.robustCovariance[0][0]),
        reference.robustErrors[0],
      ),
      slopeError: logRelativeError(
        Math.sqrt(fit.robustCovariance[1][1]),
        reference.robustErrors[1],
      ),
    };
    console.log(`ladder logit, prices from ${base}: ${JSON.stringify(digits)}`);
    // 50-digit reference for each
    for (const value of Object.values(digits))
      expect(value).toBeGreaterThanOrEqual(REQUIRED_DIGITS);
  });
});
