import { fittedCurveFrom } from '@shared/analysis/fitted-curve';
import { linearDescription, zeroCovariance } from '../testing/linear-description';
import { demandBandDatasets, demandBandPolygon } from './demand-band';

const demand = fittedCurveFrom(linearDescription());
const prices = [10, 20, 30];

describe('the demand band on the supply-and-demand chart', () => {
  it('runs up the high edge and back down the low edge, closed, price up the side', () => {
    const polygon = demandBandPolygon(demand, prices, 0.95)!;
    expect(polygon.map((p) => p.y)).toEqual([10, 20, 30, 30, 20, 10, 10]);
    for (const [i, price] of prices.entries()) {
      const band = demand.quantityInterval!(price, 0.95);
      expect(polygon[i].x).toBeCloseTo(band.high, 10);
      expect(polygon[5 - i].x).toBeCloseTo(band.low, 10);
    }
    expect(polygon.at(-1)).toEqual(polygon[0]);
  });

  it('brackets the estimate: the high edge right of demand, the low edge left of it', () => {
    const polygon = demandBandPolygon(demand, prices, 0.95)!;
    // Q = 100 − 2P: 80, 60, 40 at 10, 20, 30 (CHECKS.md §8).
    expect(polygon.slice(0, 3).map((p) => p.x > 100 - 2 * p.y)).toEqual([true, true, true]);
    expect(polygon.slice(3, 6).map((p) => p.x < 100 - 2 * p.y)).toEqual([true, true, true]);
  });

  it('is the band the fit gives: it shrinks to the line when the curve is known exactly', () => {
    const exact = fittedCurveFrom(linearDescription(zeroCovariance));
    for (const point of demandBandPolygon(exact, prices, 0.95)!) {
      expect(point.x).toBeCloseTo(100 - 2 * point.y, 10);
    }
  });

  it('draws nothing for a fit without a band', () => {
    const unbanded = { ...demand, quantityInterval: undefined };
    expect(demandBandPolygon(unbanded, prices, 0.95)).toBeNull();
    expect(demandBandDatasets(unbanded, prices, 0.95)).toEqual([]);
  });

  it('labels the band with its level', () => {
    expect(demandBandDatasets(demand, prices, 0.9)[0].label).toBe('Demand: 90 % band');
  });
});
