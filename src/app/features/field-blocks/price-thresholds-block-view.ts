import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import {
  thresholdQuestions,
  type PriceThresholdsAnswer,
  type PriceThresholdsBlock,
  type ThresholdField,
} from '@shared/questionnaire/blocks/price-thresholds-block';
import { previewContext, type BlockViewContext } from './block-view-context';
import { MoneyInput } from './money-input';
import { intentLabels } from './price-ladder-block-view';

type Likelihood = 'likelihoodCheap' | 'likelihoodExpensive';

/** The four price thresholds, and the two purchase-likelihood follow-ups when asked. */
@Component({
  selector: 'app-price-thresholds-block-view',
  imports: [MoneyInput],
  template: `
    @for (question of questions; track question[0]) {
      <app-money-input
        [label]="question[1]"
        [currency]="context().currency"
        [locale]="context().locale"
        [valueMinor]="answer()?.[question[0]]"
        (valueMinorChange)="set(question[0], $event)"
      />
    }
    @if (block().askLikelihood) {
      @for (item of likelihoods; track item.field) {
        <label class="bv-field">
          <span>{{ item.label }}</span>
          <select
            class="bv-input"
            [value]="answer()?.[item.field] ?? ''"
            (change)="
              set(item.field, $any($event.target).value ? +$any($event.target).value : undefined)
            "
          >
            <option value="">Choose…</option>
            @for (label of intentLabels; track label; let level = $index) {
              <option [value]="level + 1">{{ level + 1 }} · {{ label }}</option>
            }
          </select>
        </label>
      }
    }
  `,
  styleUrl: './block-view.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PriceThresholdsBlockView {
  readonly block = input.required<PriceThresholdsBlock>();
  readonly answer = input<PriceThresholdsAnswer | undefined>();
  readonly context = input<BlockViewContext>(previewContext);
  readonly labelledBy = input<string>('');
  readonly answerChange = output<PriceThresholdsAnswer | undefined>();

  protected readonly questions = thresholdQuestions;
  protected readonly intentLabels = intentLabels;
  protected readonly likelihoods: { field: Likelihood; label: string }[] = [
    { field: 'likelihoodCheap', label: 'How likely would they buy it at the bargain price?' },
    { field: 'likelihoodExpensive', label: 'How likely would they buy it at the expensive price?' },
  ];

  /** Keeps the other parts as they are; a part not given yet is left out of the answer. */
  protected set(field: ThresholdField | Likelihood, value: number | undefined): void {
    const next: Record<string, number | undefined> = { ...this.answer(), [field]: value };
    for (const key of Object.keys(next)) if (next[key] === undefined) delete next[key];
    this.answerChange.emit(next as unknown as PriceThresholdsAnswer);
  }
}
