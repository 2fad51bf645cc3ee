import { ChangeDetectionStrategy, Component } from '@angular/core';
import { MatCheckbox } from '@angular/material/checkbox';
import type { PriceThresholdsBlock } from '@shared/questionnaire/blocks/price-thresholds-block';
import { MoneyField } from '../fields/money-field';
import { KindSettings, settingsStyles } from './kind-settings';

/** Price thresholds: the highest amount accepted and the optional likelihood follow-ups. */
@Component({
  selector: 'app-price-thresholds-settings',
  imports: [MatCheckbox, MoneyField],
  template: `
    <app-money-field
      label="Highest price accepted"
      [valueMinor]="block().maxPriceMinor"
      [money]="money()"
      [readOnly]="readOnly()"
      (valueMinorChange)="patch({ maxPriceMinor: $any($event) })"
    />
    <mat-checkbox
      [checked]="block().askLikelihood"
      [disabled]="readOnly()"
      (change)="patch({ askLikelihood: $event.checked })"
    >
      Ask how likely they are to buy at their bargain and expensive prices (1–5)
    </mat-checkbox>
  `,
  styles: settingsStyles,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PriceThresholdsSettings extends KindSettings<PriceThresholdsBlock> {}
