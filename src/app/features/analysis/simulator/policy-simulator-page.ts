import {
  ChangeDetectionStrategy,
  Component,
  computed,
  inject,
  linkedSignal,
  signal,
} from '@angular/core';
import { FormsModule } from '@angular/forms';
import { MatCardModule } from '@angular/material/card';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatRadioModule } from '@angular/material/radio';
import { RouterLink } from '@angular/router';
import { AnalysisWorkspaceState } from '../analysis-workspace-state';
import { curveEnsemble } from '@shared/analysis/curve-ensemble';
import { EstimateValue } from '../figures/estimate-value';
import { FitPicker } from '../results/fit-picker';
import { PolicyChart } from './policy-chart';
import { policyFigureLines } from './policy-figure-lines';
import { simulatePolicy, type PolicyInputs, type PolicyKind } from './policy-simulation';

/**
 * The price-policy simulator: a per-unit tax, a subsidy or a co-payment against a supply curve
 * of stated elasticity, on the selected fit's demand curve.
 */
@Component({
  selector: 'app-policy-simulator-page',
  imports: [
    EstimateValue,
    FitPicker,
    FormsModule,
    MatCardModule,
    MatFormFieldModule,
    MatInput,
    MatRadioModule,
    PolicyChart,
    RouterLink,
  ],
  templateUrl: './policy-simulator-page.html',
  styleUrl: './policy-simulator-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PolicySimulatorPage {
  protected readonly state = inject(AnalysisWorkspaceState);
  protected readonly fit = this.state.selectedFit;
  private readonly result = computed(() => this.fit()?.result ?? null);

  protected readonly kind = signal<PolicyKind>('unit-tax');
  protected readonly amount = signal<number | null>(null);
  protected readonly buyerPercent = signal<number | null>(50);
  protected readonly supplyElasticity = signal<number | null>(1);
  protected readonly marketPrice = linkedSignal<number | null>(() => {
    const range = this.result()?.curve?.observedPriceRange;
    return range ? roundPrice((range.min + range.max) / 2) : null;
  });
  /** A tenth of today's price is a tax worth looking at; the researcher types their own. */
  protected readonly amountShown = computed(
    () => this.amount() ?? roundPrice((this.marketPrice() ?? 0) / 10),
  );

  protected readonly ensemble = computed(() => {
    const result = this.result();
    return result?.curve ? curveEnsemble(result.curve, this.fit()!.spec.confidenceLevel) : null;
  });
  protected readonly quantityKind = computed(
    () => this.result()?.schedule?.quantityKind ?? 'quantity',
  );
  protected readonly simulation = computed(() => {
    const ensemble = this.ensemble();
    if (!ensemble) return null;
    const inputs: PolicyInputs = {
      kind: this.kind(),
      amount: this.amountShown(),
      buyerPercent: this.buyerPercent() ?? Number.NaN,
      supplyElasticity: this.supplyElasticity() ?? Number.NaN,
      marketPrice: this.marketPrice() ?? Number.NaN,
    };
    return simulatePolicy(ensemble, inputs);
  });
  protected readonly lines = computed(() => {
    const simulation = this.simulation();
    return simulation?.ok
      ? policyFigureLines(simulation.figures, this.kind(), this.quantityKind())
      : [];
  });
  protected readonly quantityTitle = computed(() =>
    this.quantityKind() === 'share' ? 'Buying share (per potential buyer)' : 'Quantity per period',
  );

  protected pick(fitId: string): void {
    void this.state.selectFit(fitId);
  }

  protected setNumber(
    target: 'amount' | 'buyerPercent' | 'supplyElasticity' | 'marketPrice',
    value: number | string | null,
  ): void {
    const parsed = value === '' || value === null ? null : Number(value);
    const signals = {
      amount: this.amount,
      buyerPercent: this.buyerPercent,
      supplyElasticity: this.supplyElasticity,
      marketPrice: this.marketPrice,
    };
    signals[target].set(parsed);
  }
}

function roundPrice(value: number): number {
  return Math.round(value * 100) / 100;
}
