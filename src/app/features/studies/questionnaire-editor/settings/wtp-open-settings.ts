import { ChangeDetectionStrategy, Component } from '@angular/core';
import type { WtpOpenBlock } from '@shared/questionnaire/blocks/wtp-open-block';
import { MoneyField } from '../fields/money-field';
import { KindSettings, settingsStyles } from './kind-settings';

/** Open willingness to pay: the range of amounts the device accepts. */
@Component({
  selector: 'app-wtp-open-settings',
  imports: [MoneyField],
  template: `
    <div class="pair">
      <app-money-field
        label="Lowest amount"
        [valueMinor]="block().minMinor"
        [money]="money()"
        [readOnly]="readOnly()"
        (valueMinorChange)="patch({ minMinor: $any($event) })"
      />
      <app-money-field
        label="Highest amount"
        [valueMinor]="block().maxMinor"
        [money]="money()"
        [readOnly]="readOnly()"
        (valueMinorChange)="patch({ maxMinor: $any($event) })"
      />
    </div>
  `,
  styles: settingsStyles,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class WtpOpenSettings extends KindSettings<WtpOpenBlock> {}
