import {
  defaultSetupValues,
  fitSpecFrom,
  weightingOf,
  type FitSetupValues,
} from './fit-setup-values';
import { targetTotals, withMarginFor } from './margin-rows';

const start = defaultSetupValues({ min: 2, max: 12 });

describe('fitSpecFrom', () => {
  it('turns a fresh set-up into a valid observed-prices spec with no filters but flags', () => {
    const result = fitSpecFrom(start);
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.spec).toMatchObject({
      method: 'observed-prices',
      filters: { flagged: 'exclude' },
      weighting: null,
      priceGrid: { from: 2, to: 12, steps: 11 },
      confidenceLevel: 0.95,
      form: 'loglog',
      standardErrors: 'hc1',
    });
  });

  it('keeps only what the method takes', () => {
    const ladder = fitSpecFrom({ ...start, method: 'price-ladder' });
    expect(ladder.ok && Object.keys(ladder.spec).sort()).toEqual(
      ['confidenceLevel', 'filters', 'method', 'priceGrid', 'unitCost', 'weighting'].sort(),
    );
  });

  it('passes dates, routes and regions through when they are set', () => {
    const values: FitSetupValues = {
      ...start,
      from: '2026-10-01',
      to: '2026-10-31',
      regions: ['Lakeshore North'],
    };
    const result = fitSpecFrom(values);
    expect(result.ok && result.spec.filters).toEqual({
      from: '2026-10-01',
      to: '2026-10-31',
      regions: ['Lakeshore North'],
      flagged: 'exclude',
    });
  });

  it('names the field at fault: a grid that ends below its start, a missing price', () => {
    const reversed = fitSpecFrom({ ...start, gridFrom: 10, gridTo: 5 });
    expect(reversed).toEqual({
      ok: false,
      issues: [{ path: 'priceGrid.to', message: 'The highest price must be above the lowest' }],
    });
    const missing = fitSpecFrom({ ...start, gridFrom: null });
    expect(!missing.ok && missing.issues[0]).toEqual({
      path: 'priceGrid.from',
      message: 'Give the lowest price',
    });
  });

  it('groups the raking table into one margin per variable', () => {
    const rows = withMarginFor([], 'region', [
      { value: 'North', label: 'North' },
      { value: 'South', label: 'South' },
    ]).map((row, i) => ({ ...row, targetPercent: [40, 60][i] }));
    expect(weightingOf(rows)).toEqual({
      margins: [{ variable: 'region', targets: { North: 40, South: 60 } }],
    });
    expect(targetTotals(rows)).toEqual([{ variable: 'region', total: 100 }]);
    const result = fitSpecFrom({ ...start, weightingOn: true, margins: rows });
    expect(result.ok).toBe(true);
  });

  it('refuses a margin with a single level', () => {
    const result = fitSpecFrom({
      ...start,
      weightingOn: true,
      margins: [{ variable: 'household-size', level: '1-2', targetPercent: 100 }],
    });
    expect(!result.ok && result.issues[0].path).toBe('weighting.margins.0.targets');
  });
});
