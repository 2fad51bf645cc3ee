import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import {
  likelihoodQuestions,
  thresholdFieldNames,
  thresholdQuestions,
  type LikelihoodField,
  type PriceThresholdsAnswer,
  type PriceThresholdsBlock,
  type ThresholdField,
} from '@shared/questionnaire/blocks/price-thresholds-block';
import { previewContext, type BlockViewContext } from './block-view-context';
import { MoneyInput } from './money-input';
import { intentLabels } from './price-ladder-block-view';

/** The four price thresholds, and the two purchase-likelihood follow-ups when asked. */
@Component({
  selector: 'app-price-thresholds-block-view',
  imports: [MoneyInput],
  template: `
    @for (question of questions; track question[0]) {
      <app-money-input
        [part]="question[0]"
        [name]="names[question[0]]"
        [label]="question[1]"
        [currency]="context().currency"
        [locale]="context().locale"
        [valueMinor]="answer()?.[question[0]]"
        (valueMinorChange)="set(question[0], $event)"
      />
    }
    @if (block().askLikelihood) {
      @for (item of likelihoods; track item[0]) {
        @let chosen = answer()?.[item[0]];
        <label class="bv-field">
          <span>{{ item[1] }}</span>
          <!-- Each option says whether it is chosen: a [value] on the select would be applied
               before the options exist, and a stored answer would show as unchosen. -->
          <select
            class="bv-input"
            (change)="
              set(item[0], $any($event.target).value ? +$any($event.target).value : undefined)
            "
          >
            <option value="" [selected]="chosen === undefined || chosen === null">Choose…</option>
            @for (label of intentLabels; track label; let level = $index) {
              <option [value]="level + 1" [selected]="chosen === level + 1">
                {{ level + 1 }} · {{ label }}
              </option>
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
  protected readonly names = thresholdFieldNames;
  protected readonly intentLabels = intentLabels;
  protected readonly likelihoods = likelihoodQuestions;

  /** Keeps the other parts as they are; a part not given yet is left out of the answer. */
  protected set(field: ThresholdField | LikelihoodField, value: number | undefined): void {
    const next: Record<string, number | undefined> = { ...this.answer(), [field]: value };
    for (const key of Object.keys(next)) if (next[key] === undefined) delete next[key];
    this.answerChange.emit(next as unknown as PriceThresholdsAnswer);
  }
}
