import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import {
  purchaseRecallFieldNames,
  type PurchaseRecallAnswer,
  type PurchaseRecallBlock,
} from '@shared/questionnaire/blocks/purchase-recall-block';
import { previewContext, type BlockViewContext } from './block-view-context';
import { MoneyInput } from './money-input';

/** Units bought in the period, and the price paid the last time when something was bought. */
@Component({
  selector: 'app-purchase-recall-block-view',
  imports: [MoneyInput],
  template: `
    <label class="bv-field">
      <span>{{ names().units }}</span>
      <input
        class="bv-input"
        type="number"
        inputmode="numeric"
        min="0"
        step="1"
        [attr.max]="block().maxUnits"
        [value]="answer()?.units ?? ''"
        (input)="setUnits($any($event.target).value)"
      />
    </label>
    @if (block().askPricePaid && (answer()?.units ?? 0) > 0) {
      <app-money-input
        part="pricePaidMinor"
        [label]="names().pricePaidMinor"
        [currency]="context().currency"
        [locale]="context().locale"
        [valueMinor]="answer()?.pricePaidMinor"
        (valueMinorChange)="setPrice($event)"
      />
    }
  `,
  styleUrl: './block-view.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PurchaseRecallBlockView {
  readonly block = input.required<PurchaseRecallBlock>();
  readonly answer = input<PurchaseRecallAnswer | undefined>();
  readonly context = input<BlockViewContext>(previewContext);
  readonly labelledBy = input<string>('');
  readonly answerChange = output<PurchaseRecallAnswer | undefined>();

  protected readonly names = computed(() => purchaseRecallFieldNames(this.block()));

  protected setUnits(text: string): void {
    const units = Number(text);
    if (text.trim() === '' || !Number.isFinite(units)) {
      this.answerChange.emit(undefined);
      return;
    }
    const price = this.answer()?.pricePaidMinor;
    // No price is asked once nothing was bought, so a price typed earlier is dropped.
    this.answerChange.emit(
      units > 0 && price !== undefined ? { units, pricePaidMinor: price } : { units },
    );
  }

  protected setPrice(pricePaidMinor: number | undefined): void {
    const units = this.answer()?.units ?? 0;
    this.answerChange.emit(pricePaidMinor === undefined ? { units } : { units, pricePaidMinor });
  }
}
