import type { FitSpec } from '@shared/analysis/fit-spec';
import { commonSpecFields as common, shelfFitSpec as ols } from '../testing/fit-spec-fixtures';
import { FigureFormat } from '../figures/figure-format';
import { fitDistinctions } from './fit-distinctions';

const format = new FigureFormat('KES', 'en-KE');
const linesOf = (...specs: FitSpec[]) => [
  ...fitDistinctions(
    specs.map((spec, i) => ({ id: `fit-${i}`, spec })),
    format,
  ).values(),
];

describe('what tells fits apart', () => {
  it('gives two least-squares fits that differ in form and instrument different lines', () => {
    const [a, b] = linesOf(ols, {
      ...ols,
      form: 'linear',
      instrument: 'peer-price',
      standardErrors: 'cluster-point',
    });
    expect(a).toBe(
      'shelf observations · log-log · no instrument · HC1 errors · all interviews · unweighted',
    );
    expect(b).toBe(
      'shelf observations · linear · instrumented by peer price (2SLS) · errors clustered by point · all interviews · unweighted',
    );
  });

  it('names the filters and the weighting', () => {
    const [line] = linesOf({
      ...ols,
      covariates: ['income'],
      regionEffects: true,
      filters: {
        from: '2026-11-03',
        to: '2026-11-20',
        routeIds: ['1f2e3d4c-5b6a-4798-8a7b-6c5d4e3f2a1b', '2f2e3d4c-5b6a-4798-8a7b-6c5d4e3f2a1b'],
        flagged: 'exclude',
      },
      weighting: {
        margins: [
          { variable: 'income-band', targets: { low: 0.5, high: 0.5 } },
          { variable: 'region', targets: { north: 0.4, south: 0.6 } },
        ],
      },
    });
    expect(line).toContain('+ income · region effects');
    expect(line).toContain('3 Nov–20 Nov · 2 routes · flagged left out');
    expect(line).toContain('raked to income band, region');
  });

  it('adds a setting such as the unit cost or the band only where fits of a method differ on it', () => {
    const [plain, costed] = linesOf(ols, { ...ols, unitCost: 1200, confidenceLevel: 0.9 });
    expect(plain).toContain('95 % band · no unit cost');
    expect(costed).toContain(`90 % band · unit cost ${format.value(1200, 'price')}`);
    expect(plain).not.toContain('grid');
    const [alone] = linesOf({ ...ols, unitCost: 1200 });
    expect(alone).not.toContain('unit cost');
  });

  it('tells apart open willingness-to-pay fits by their resampling and card fits by distribution', () => {
    const [wtp, card] = linesOf(
      { method: 'wtp-open', ...common, bootstrap: { replicates: 2000, seed: 7 } },
      { method: 'payment-card', ...common, distribution: 'logistic' },
    );
    expect(wtp.startsWith('2000 resamples, seed 7 · all interviews')).toBe(true);
    expect(card.startsWith('logistic WTP · all interviews')).toBe(true);
  });

  it('shows the price grid when two ladder fits differ only there', () => {
    const ladder: FitSpec = { method: 'price-ladder', ...common };
    const [, wide] = linesOf(ladder, {
      ...ladder,
      priceGrid: { from: 0, to: 5000, steps: 11 },
    });
    expect(wide).toContain(
      `grid ${format.value(0, 'price')}–${format.value(5000, 'price')}, 11 prices`,
    );
  });
});
