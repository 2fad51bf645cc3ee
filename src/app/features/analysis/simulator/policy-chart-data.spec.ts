import { fittedCurveFrom } from '@shared/analysis/fitted-curve';
import { policyIncidence } from '@shared/estimation/welfare/policy-incidence';
import { constantElasticitySupply } from '@shared/estimation/welfare/supply-curve';
import { linearDescription } from '../testing/linear-description';
import { deadweightLossPolygon, policyChartData, wedgeRectangle } from './policy-chart-data';

// Q = 100 − 2P against Qs = 3P (elasticity 1 through (20, 60)) with a tax of 5:
// buyers 23, sellers 18, quantity 54 (computed here by hand).
const demand = fittedCurveFrom(linearDescription());
const supply = constantElasticitySupply(20, 60, 1);
const result = policyIncidence(demand, supply, { kind: 'unit-tax', amount: 5 });
const close = (a: number, b: number) => expect(Math.abs(a - b)).toBeLessThan(1e-8);

describe('policy chart data', () => {
  it('shades the deadweight loss as the closed triangle (54, 23), (60, 20), (54, 18)', () => {
    const polygon = deadweightLossPolygon(demand, supply, result);
    const first = polygon[0];
    close(first.x, 54);
    close(first.y, 23);
    expect(polygon.at(-1)).toEqual(first);
    expect(polygon.some((p) => Math.abs(p.x - 60) < 1e-8 && Math.abs(p.y - 20) < 1e-8)).toBe(true);
    const sellerCorner = polygon.at(-2)!;
    close(sellerCorner.x, 54);
    close(sellerCorner.y, 18);
  });

  it('draws the wedge between seller and buyer prices over the new quantity', () => {
    const corners = wedgeRectangle(result).map((p) =>
      [p.x, p.y].map((v) => Math.round(v * 1e6) / 1e6),
    );
    expect(corners).toEqual([
      [0, 18],
      [54, 18],
      [54, 23],
      [0, 23],
      [0, 18],
    ]);
  });

  it('puts both curves quantity across and price up, with labelled areas and prices', () => {
    const data = policyChartData(demand, supply, result, 'unit-tax', 0.95);
    expect(data.datasets.map((d) => d.label)).toEqual([
      'Demand: 95 % band',
      'Deadweight loss',
      'Tax revenue',
      'Demand (estimate)',
      'Supply (assumed)',
      'Buyer price',
      'Seller price',
      'Market today',
    ]);
    const demandLine = data.datasets[3].data;
    for (const point of demandLine) close(point.x, 100 - 2 * point.y);
    const supplyLine = data.datasets[4].data;
    for (const point of supplyLine) close(point.x, 3 * point.y);
    expect(data.datasets[0].fill).toBe('shape');
    expect(data.datasets[1].fill).toBe('shape');
  });

  it('names the wedge a subsidy cost for a subsidy', () => {
    const subsidy = policyIncidence(demand, supply, { kind: 'unit-subsidy', amount: 5 });
    expect(policyChartData(demand, supply, subsidy, 'unit-subsidy', 0.95).datasets[2].label).toBe(
      'Subsidy cost',
    );
  });

  it('says the demand line is only the central estimate when the fit gives no band', () => {
    const unbanded = { ...demand, quantityInterval: undefined };
    const labels = policyChartData(unbanded, supply, result, 'unit-tax', 0.95).datasets.map(
      (d) => d.label,
    );
    expect(labels).not.toContain('Demand: 95 % band');
    expect(labels).toContain('Demand: central estimate (this fit gives no band)');
  });
});
