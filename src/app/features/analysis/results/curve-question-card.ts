import { ChangeDetectionStrategy, Component, computed, input, linkedSignal } from '@angular/core';
import { FormsModule } from '@angular/forms';
import { MatCardModule } from '@angular/material/card';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { curveFigures, type FigureOutcome } from '../figures/curve-figures';
import type { CurveEnsemble } from '@shared/analysis/estimated-figure';
import { EstimateValue } from '../figures/estimate-value';
import type { FigureFormat, FigureUnit } from '../figures/figure-format';

interface FigureLine {
  readonly label: string;
  readonly unit: FigureUnit;
  readonly outcome: FigureOutcome;
}

/**
 * Questions a researcher puts to the fitted curve: quantity, elasticity and consumer surplus at a
 * price they type; the revenue-maximising price; the profit-maximising price for a unit cost.
 * Each answer is an estimate with a simulation interval from the fit's covariance.
 */
@Component({
  selector: 'app-curve-question-card',
  imports: [EstimateValue, FormsModule, MatCardModule, MatFormFieldModule, MatInput],
  templateUrl: './curve-question-card.html',
  styleUrl: './curve-question-card.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CurveQuestionCard {
  readonly ensemble = input.required<CurveEnsemble>();
  readonly format = input.required<FigureFormat>();
  readonly quantityKind = input.required<'quantity' | 'share'>();
  readonly startPrice = input.required<number>();
  readonly startUnitCost = input<number | null>(null);

  protected readonly price = linkedSignal<number | null>(() => this.startPrice());
  protected readonly unitCost = linkedSignal<number | null>(() => this.startUnitCost());

  protected readonly lines = computed((): FigureLine[] => {
    const figures = curveFigures(this.ensemble(), this.price(), this.unitCost());
    const perBuyer = this.quantityKind() === 'share' ? ' per potential buyer' : '';
    const lines: (FigureLine | null)[] = [
      figures.quantityAtPrice && {
        label:
          this.quantityKind() === 'share' ? 'Buying share at this price' : 'Quantity at this price',
        unit: this.quantityKind(),
        outcome: figures.quantityAtPrice,
      },
      figures.elasticityAtPrice && {
        label: 'Price elasticity at this price',
        unit: 'elasticity',
        outcome: figures.elasticityAtPrice,
      },
      figures.consumerSurplusAtPrice && {
        label: `Consumer surplus at this price${perBuyer}`,
        unit: 'price',
        outcome: figures.consumerSurplusAtPrice,
      },
      { label: 'Revenue-maximising price', unit: 'price', outcome: figures.revenueMaxPrice },
      figures.profitMaxPrice && {
        label: 'Profit-maximising price for this unit cost',
        unit: 'price',
        outcome: figures.profitMaxPrice,
      },
    ];
    return lines.filter((line): line is FigureLine => line !== null);
  });

  protected setNumber(target: 'price' | 'unitCost', value: number | string | null): void {
    const parsed = value === '' || value === null ? null : Number(value);
    (target === 'price' ? this.price : this.unitCost).set(parsed);
  }
}
