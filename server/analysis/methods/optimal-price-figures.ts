import type { KeyFigure } from '@shared/analysis/fit-result';
import type { FittedDemandCurve } from '@shared/estimation/demand-schedule/fitted-demand-curve';
import { EstimationError } from '@shared/estimation/estimation-error';
import { optimalPrice } from '@shared/estimation/welfare/optimal-price';
import { pointFigure } from './method-fit';

/**
 * Revenue-maximising and (with a unit cost) profit-maximising prices on a fitted curve, where
 * they exist; point estimates (the curve's own uncertainty shows in the schedule's band).
 */
export function optimalPriceFigures(
  curve: FittedDemandCurve,
  unitCost: number | null,
): KeyFigure[] {
  const figures: KeyFigure[] = [];
  const tryPrice = (label: string, cost: number) => {
    try {
      figures.push(pointFigure(label, 'price', optimalPrice(curve, cost)));
    } catch (error) {
      if (!(error instanceof EstimationError)) throw error;
    }
  };
  tryPrice('Revenue-maximising price', 0);
  if (unitCost !== null) tryPrice(`Profit-maximising price at unit cost ${unitCost}`, unitCost);
  return figures;
}
