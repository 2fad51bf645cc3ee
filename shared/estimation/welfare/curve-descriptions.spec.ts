import { EstimationError } from '../estimation-error';
import { optimalPrice } from './optimal-price';
import { constantElasticityDemand, linearDemand, logisticShareDemand } from './standard-curves';
import { linearSupply } from './supply-curve';

// What researchers and clients read about a fitted curve: four significant digits and true minus
// signs, not the engine's 16 digits and hyphens.
describe('curve descriptions', () => {
  it('writes a constant-elasticity curve to four significant digits', () => {
    const curve = constantElasticityDemand(1701773.4049410962, -1.4290034800152);
    expect(curve.description).toBe('Q = 1702000·P^−1.429');
  });

  it('writes a logistic share with the sign of its price term as an operator', () => {
    const curve = logisticShareDemand(4.740166883210224, -0.0032746888722612793, {
      min: 0,
      max: 3000,
    });
    expect(curve.description).toBe('share = 1/(1 + exp(−(4.74 − 0.003275·P)))');
  });

  it('writes linear demand and supply in the same way', () => {
    expect(linearDemand(100.123456, 2.5).description).toBe('Q = 100.1 − 2.5·P');
    expect(linearSupply(-3.333333, 1.5).description).toBe('Qs = −3.333 + 1.5·P');
  });

  it('says in words why a curve has no best price, naming the curve readably', () => {
    const curve = constantElasticityDemand(1701773.4049410962, -1.4290034800152);
    let message = '';
    try {
      optimalPrice(curve);
    } catch (error) {
      expect(error).toBeInstanceOf(EstimationError);
      message = (error as EstimationError).message;
    }
    expect(message).toBe(
      "no best price inside the curve's price range: demand is elastic (elasticity below −1), so " +
        'revenue falls as the price rises, at every price (curve Q = 1702000·P^−1.429)',
    );
  });
});
