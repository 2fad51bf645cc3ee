import { signal } from '@angular/core';
import { TestBed, type ComponentFixture } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import type { FitResource, FitSummary } from '@shared/analysis/fit-resource';
import { AnalysisWorkspaceState } from '../analysis-workspace-state';
import { FigureFormat } from '../figures/figure-format';
import { linearDescription } from '../testing/linear-description';
import { FitComparisonPage } from './fit-comparison-page';

const common = {
  filters: { flagged: 'include' },
  weighting: null,
  priceGrid: { from: 0, to: 100, steps: 21 },
  unitCost: null,
  confidenceLevel: 0.95,
};
const observed = {
  id: '1a1b1c1d-2e2f-4a3b-8c4d-5e6f7a8b9c0d',
  status: 'done',
  n: 50,
  hasSchedule: true,
  createdAt: '2026-12-02T08:05:00.000Z',
  spec: {
    method: 'observed-prices',
    ...common,
    source: 'shelf',
    form: 'linear',
    covariates: [],
    regionEffects: false,
    standardErrors: 'hc1',
    instrument: 'none',
  },
  // Q = 100 − 2P: zero from 50 up.
  result: { n: 50, curve: linearDescription() },
};
const ladder = {
  ...observed,
  id: '2a1b1c1d-2e2f-4a3b-8c4d-5e6f7a8b9c0d',
  spec: { method: 'price-ladder', ...common },
  // A purchase share with its midpoint at 20 that is all but gone by 40.
  result: {
    n: 231,
    curve: {
      kind: 'logistic-share',
      intercept: 4,
      slope: -0.2,
      covariance: [
        [0.01, 0],
        [0, 0.0001],
      ],
      observedPriceRange: { min: 0, max: 100 },
      n: 231,
    },
  },
};
const fits = [observed, ladder] as unknown as (FitSummary & FitResource)[];

const stubState = {
  finishedFits: signal(fits),
  study: signal({ currency: 'KES' }),
  // The set-up's grid middle, 50, is where both curves are at or near zero.
  setup: signal({ gridFrom: 0, gridTo: 100 }),
  format: signal(new FigureFormat('KES', 'en-KE')),
  loadFit: (id: string) => Promise.resolve(fits.find((fit) => fit.id === id)!),
};

describe('FitComparisonPage', () => {
  let fixture: ComponentFixture<FitComparisonPage>;
  let element: HTMLElement;

  beforeEach(async () => {
    TestBed.configureTestingModule({
      imports: [FitComparisonPage],
      providers: [provideRouter([]), { provide: AnalysisWorkspaceState, useValue: stubState }],
    });
    // The chart is deferred, so the page's dependencies resolve asynchronously.
    await TestBed.compileComponents();
    fixture = TestBed.createComponent(FitComparisonPage);
    element = fixture.nativeElement as HTMLElement;
    await fixture.whenStable();
    await new Promise((resolve) => setTimeout(resolve));
    await fixture.whenStable();
  });

  it('offers an index price where both curves still carry demand, not the middle of the grid', () => {
    const input = element.querySelector<HTMLInputElement>('input[name="reference-price"]')!;
    const price = Number(input.value);
    // The ladder share falls below a quarter of its top near 26 (logit 4 − 0.2p = −1.1).
    expect(price).toBeGreaterThanOrEqual(0);
    expect(price).toBeLessThanOrEqual(25);
    expect(price).not.toBe(50);
  });

  it('lets the researcher type another index price', async () => {
    const input = element.querySelector<HTMLInputElement>('input[name="reference-price"]')!;
    input.value = '30';
    input.dispatchEvent(new Event('input'));
    await fixture.whenStable();
    expect(input.value).toBe('30');
  });

  it('says under each fit what sets it apart', () => {
    const details = Array.from(element.querySelectorAll('.fits__details')).map((d) =>
      d.textContent?.trim(),
    );
    expect(details[0]).toBe(
      'shelf observations · linear · no instrument · HC1 errors · all interviews · unweighted',
    );
    expect(details[1]).toBe('all interviews · unweighted');
  });
});
