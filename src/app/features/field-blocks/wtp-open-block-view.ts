import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import {
  wtpOpenAmountName,
  type WtpOpenAnswer,
  type WtpOpenBlock,
} from '@shared/questionnaire/blocks/wtp-open-block';
import { previewContext, type BlockViewContext } from './block-view-context';
import { MoneyInput } from './money-input';

/** The most the respondent would pay, typed as an amount. */
@Component({
  selector: 'app-wtp-open-block-view',
  imports: [MoneyInput],
  template: `
    <app-money-input
      part="amountMinor"
      [label]="label"
      [currency]="context().currency"
      [locale]="context().locale"
      [valueMinor]="answer()?.amountMinor"
      (valueMinorChange)="
        answerChange.emit($event === undefined ? undefined : { amountMinor: $event })
      "
    />
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class WtpOpenBlockView {
  readonly block = input.required<WtpOpenBlock>();
  readonly answer = input<WtpOpenAnswer | undefined>();
  readonly context = input<BlockViewContext>(previewContext);
  readonly labelledBy = input<string>('');
  readonly answerChange = output<WtpOpenAnswer | undefined>();

  protected readonly label = wtpOpenAmountName;
}
