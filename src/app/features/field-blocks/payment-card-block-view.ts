import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { formatMoney } from '@shared/money/format-money';
import type {
  PaymentCardAnswer,
  PaymentCardBlock,
} from '@shared/questionnaire/blocks/payment-card-block';
import { previewContext, type BlockViewContext } from './block-view-context';

/** The card of amounts: the highest the respondent would surely pay, or none of them. */
@Component({
  selector: 'app-payment-card-block-view',
  template: `
    <ul class="bv-options" role="radiogroup" [attr.aria-labelledby]="labelledBy()">
      @for (amount of block().amountsMinor; track amount) {
        <li role="none">
          <label class="bv-option">
            <input
              type="radio"
              [name]="block().id"
              [checked]="answer()?.highestYesMinor === amount"
              (change)="answerChange.emit({ highestYesMinor: amount })"
            />
            {{ money(amount) }}
          </label>
        </li>
      }
      <li role="none">
        <label class="bv-option">
          <input
            type="radio"
            [name]="block().id"
            [checked]="answer() !== undefined && answer()?.highestYesMinor === null"
            (change)="answerChange.emit({ highestYesMinor: null })"
          />
          None of these amounts
        </label>
      </li>
    </ul>
  `,
  styleUrl: './block-view.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PaymentCardBlockView {
  readonly block = input.required<PaymentCardBlock>();
  readonly answer = input<PaymentCardAnswer | undefined>();
  readonly context = input<BlockViewContext>(previewContext);
  readonly labelledBy = input<string>('');
  readonly answerChange = output<PaymentCardAnswer | undefined>();

  protected money(minor: number): string {
    return formatMoney(minor, this.context().currency, this.context().locale);
  }
}
