import { curveEnsemble } from '@shared/analysis/curve-ensemble';
import type { CurveDescription } from '@shared/analysis/curve-description';
import { estimateOnEnsemble } from '@shared/analysis/estimated-figure';
import type { KeyFigure } from '@shared/analysis/fit-result';
import { EstimationError } from '@shared/estimation/estimation-error';
import { optimalPrice } from '@shared/estimation/welfare/optimal-price';

/**
 * Revenue-maximising and (with a unit cost) profit-maximising prices on a fitted curve, where
 * they exist, each with the percentile interval of the same price on curves drawn from the
 * coefficients' sampling distribution — the seeded draws the analysis screens use, so the key
 * figure, the published schedule and the screen agree.
 */
export function optimalPriceFigures(
  curve: CurveDescription,
  unitCost: number | null,
  confidenceLevel: number,
): KeyFigure[] {
  const ensemble = curveEnsemble(curve, confidenceLevel);
  const figures: KeyFigure[] = [];
  const tryPrice = (label: string, cost: number) => {
    try {
      const price = estimateOnEnsemble(ensemble, (c) => optimalPrice(c, cost));
      figures.push({
        label,
        unit: 'price',
        estimate: price.estimate,
        ciLow: price.low,
        ciHigh: price.high,
      });
    } catch (error) {
      if (!(error instanceof EstimationError)) throw error;
    }
  };
  tryPrice('Revenue-maximising price', 0);
  if (unitCost !== null) tryPrice(`Profit-maximising price at unit cost ${unitCost}`, unitCost);
  return figures;
}
