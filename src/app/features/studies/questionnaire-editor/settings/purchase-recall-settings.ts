import { ChangeDetectionStrategy, Component } from '@angular/core';
import { MatCheckbox } from '@angular/material/checkbox';
import type { PurchaseRecallBlock } from '@shared/questionnaire/blocks/purchase-recall-block';
import { NumberField } from '../fields/number-field';
import { KindSettings, settingsStyles } from './kind-settings';

/** Purchase recall: the period remembered, the most units, and whether the price is asked. */
@Component({
  selector: 'app-purchase-recall-settings',
  imports: [MatCheckbox, NumberField],
  template: `
    <div class="pair">
      <app-number-field
        label="Period remembered"
        suffix="days"
        [value]="block().periodDays"
        [readOnly]="readOnly()"
        (valueChange)="patch({ periodDays: $any($event) })"
      />
      <app-number-field
        label="Most units accepted"
        [value]="block().maxUnits"
        [readOnly]="readOnly()"
        (valueChange)="patch({ maxUnits: $any($event) })"
      />
    </div>
    <mat-checkbox
      [checked]="block().askPricePaid"
      [disabled]="readOnly()"
      (change)="patch({ askPricePaid: $event.checked })"
    >
      Ask the price paid per unit
    </mat-checkbox>
  `,
  styles: settingsStyles,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PurchaseRecallSettings extends KindSettings<PurchaseRecallBlock> {}
