import { signal } from '@angular/core';
import { TestBed, type ComponentFixture } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import type { FitResource, FitSummary } from '@shared/analysis/fit-resource';
import { AnalysisWorkspaceState } from '../analysis-workspace-state';
import { FigureFormat } from '../figures/figure-format';
import { linearDescription } from '../testing/linear-description';
import { PolicySimulatorPage } from './policy-simulator-page';

// Only what the simulator reads of a fit: the curve Q = 100 − 2P and its schedule's kind.
const fit = {
  id: '5d6e7f8a-9b0c-4d1e-8f2a-3b4c5d6e7f8a',
  spec: { method: 'price-ladder', confidenceLevel: 0.95 },
  result: { curve: linearDescription(), schedule: { quantityKind: 'quantity' } },
} as unknown as FitResource;

const stubState = {
  finishedFits: signal<FitSummary[]>([]),
  selectedFitId: signal<string | null>(fit.id),
  selectedFit: signal(fit),
  format: signal(new FigureFormat('KES', 'en-KE')),
  selectFit: () => Promise.resolve(),
};

describe('PolicySimulatorPage', () => {
  let fixture: ComponentFixture<PolicySimulatorPage>;
  let element: HTMLElement;

  beforeEach(async () => {
    TestBed.configureTestingModule({
      imports: [PolicySimulatorPage],
      providers: [provideRouter([]), { provide: AnalysisWorkspaceState, useValue: stubState }],
    });
    // The chart is deferred, so the page's dependencies resolve asynchronously.
    await TestBed.compileComponents();
    fixture = TestBed.createComponent(PolicySimulatorPage);
    element = fixture.nativeElement as HTMLElement;
    await fixture.whenStable();
  });

  async function choose(kind: string): Promise<void> {
    const radio = Array.from(element.querySelectorAll('mat-radio-button')).find(
      (r) => r.textContent?.trim() === kind,
    )!;
    radio.querySelector('input')!.click();
    await fixture.whenStable();
  }

  async function type(name: string, value: string): Promise<void> {
    const input = element.querySelector<HTMLInputElement>(`input[name="${name}"]`)!;
    input.value = value;
    input.dispatchEvent(new Event('input'));
    await fixture.whenStable();
  }

  const labels = () =>
    Array.from(element.querySelectorAll('.outcome dt')).map((dt) => dt.textContent?.trim());

  it('speaks of the subsidy’s benefit to each side, not of a burden', async () => {
    await choose('Subsidy per unit');
    await type('policy-amount', '5');
    expect(labels()).toContain('Buyers’ share of the subsidy’s benefit');
    expect(labels()).toContain('Sellers’ share of the subsidy’s benefit');
    expect(labels().some((label) => /borne/i.test(label ?? ''))).toBe(false);
  });

  it('keeps "borne" for a tax', async () => {
    await choose('Tax per unit');
    expect(labels()).toContain('Borne by buyers');
  });

  it('takes the co-payment share in percent, as every other share is typed', async () => {
    await choose('Co-payment');
    const field = element.querySelector('input[name="buyer-share"]')!.closest('mat-form-field')!;
    expect(field.textContent).toContain('Buyer pays this share of the price (%)');
    await type('buyer-share', '40');
    expect(element.querySelector('.outcome__problem')).toBeNull();
    // Q = 100 − 2P, supply 3P through (20, 60): 100 − 2·0.4·ps = 3ps, ps = 26.32 (by hand).
    const seller = element.querySelector('[data-figure="sellerPrice"]')?.textContent;
    expect(seller).toContain('26.32');
  });

  it('says the share goes in percent when it is out of range', async () => {
    await choose('Co-payment');
    await type('buyer-share', '140');
    expect(element.querySelector('.outcome__problem')?.textContent).toBe(
      'Enter the buyer’s share in percent, above 0 and below 100 (say 40).',
    );
  });
});
