import { ChangeDetectionStrategy, Component } from '@angular/core';
import type { PaymentCardBlock } from '@shared/questionnaire/blocks/payment-card-block';
import { AmountList } from '../fields/amount-list';
import { KindSettings, settingsStyles } from './kind-settings';

/** Payment card: the amounts on the card, increasing. */
@Component({
  selector: 'app-payment-card-settings',
  imports: [AmountList],
  template: `
    <app-amount-list
      legend="Amounts on the card, lowest first"
      noun="Amount"
      [amounts]="block().amountsMinor"
      [money]="money()"
      [readOnly]="readOnly()"
      (amountsChange)="patch({ amountsMinor: $any($event) })"
    />
  `,
  styles: settingsStyles,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PaymentCardSettings extends KindSettings<PaymentCardBlock> {}
