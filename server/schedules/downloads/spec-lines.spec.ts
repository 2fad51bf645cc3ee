import type { FitSpec } from '@shared/analysis/fit-spec';
import { specLines } from './spec-lines';

const spec: FitSpec = {
  method: 'observed-prices',
  filters: { flagged: 'exclude', regions: ['North shore'] },
  weighting: { margins: [{ variable: 'income-band', targets: { low: 0.6, high: 0.4 } }] },
  priceGrid: { from: 800, to: 2600, steps: 10 },
  unitCost: null,
  confidenceLevel: 0.95,
  source: 'shelf',
  form: 'loglog',
  covariates: ['income'],
  regionEffects: true,
  standardErrors: 'hc1',
  instrument: 'peer-price',
};

describe('specLines', () => {
  const lines = new Map(specLines(spec, 'KES'));

  it('writes the specification as labelled lines in words, not JSON', () => {
    expect(lines.get('Method')).toBe('Observed prices and quantities (least squares)');
    expect(lines.get('Price grid')).toBe('10 prices from KES\u00a0800 to KES\u00a02,600');
    expect(lines.get('Interviews')).toBe(
      'accepted interviews, in North shore, without quality flags',
    );
    expect(lines.get('Weighting')).toBe('raked to population margins of income band');
    expect(lines.get('Demand form')).toBe('Log-log (constant elasticity)');
    expect(lines.get('Instrument')).toMatch(/two-stage least squares/);
    expect([...lines.values()].join(' ')).not.toMatch(/[{}"]/);
  });

  it('says plainly when there is no weighting or unit cost', () => {
    const plain = new Map(specLines({ ...spec, weighting: null }, 'KES'));
    expect(plain.get('Weighting')).toBe('none: every respondent counts once');
    expect(plain.get('Unit cost')).toBe('none given');
  });
});
