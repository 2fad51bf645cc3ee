import { ChangeDetectionStrategy, Component, computed } from '@angular/core';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatSelectModule } from '@angular/material/select';
import { formatMoney } from '@shared/money/format-money';
import {
  type ShelfObservationBlock,
  defaultShelfPriceCapMinor,
} from '@shared/questionnaire/blocks/shelf-observation-block';
import { MoneyField } from '../fields/money-field';
import { NumberField } from '../fields/number-field';
import { KindSettings, settingsStyles } from './kind-settings';

/**
 * Shelf observation: pack unit, what is counted (and over how long), the tag photo, and the
 * highest price the device takes, which may be left to the general cap.
 */
@Component({
  selector: 'app-shelf-observation-settings',
  imports: [MatFormFieldModule, MatSelectModule, MoneyField, NumberField],
  template: `
    <div class="pair">
      <mat-form-field appearance="outline">
        <mat-label>Pack size unit</mat-label>
        <mat-select
          [value]="block().packUnit"
          [disabled]="readOnly()"
          (valueChange)="patch({ packUnit: $event })"
        >
          <mat-option value="g">grams</mat-option>
          <mat-option value="kg">kilograms</mat-option>
          <mat-option value="ml">millilitres</mat-option>
          <mat-option value="l">litres</mat-option>
          <mat-option value="piece">pieces</mat-option>
        </mat-select>
      </mat-form-field>
      <mat-form-field appearance="outline">
        <mat-label>Price-tag photo</mat-label>
        <mat-select
          [value]="block().photo"
          [disabled]="readOnly()"
          (valueChange)="patch({ photo: $event })"
        >
          <mat-option value="required">Required</mat-option>
          <mat-option value="optional">Optional</mat-option>
          <mat-option value="none">Not taken</mat-option>
        </mat-select>
      </mat-form-field>
    </div>
    <div class="pair">
      <mat-form-field appearance="outline">
        <mat-label>Count</mat-label>
        <mat-select
          [value]="block().measure"
          [disabled]="readOnly()"
          (valueChange)="setMeasure($event)"
        >
          <mat-option value="units-sold">Units sold over a period</mat-option>
          <mat-option value="stock-on-hand">Stock on hand at the visit</mat-option>
        </mat-select>
      </mat-form-field>
      @if (block().measure === 'units-sold') {
        <app-number-field
          label="Period"
          suffix="days"
          [value]="block().periodDays"
          [readOnly]="readOnly()"
          (valueChange)="patch({ periodDays: $event })"
        />
      }
    </div>
    <app-money-field
      label="Highest shelf price an enumerator may record"
      [valueMinor]="block().maxPriceMinor"
      [money]="money()"
      [readOnly]="readOnly()"
      [emptyHint]="defaultCapHint()"
      (valueMinorChange)="patch({ maxPriceMinor: $event })"
    />
  `,
  styles: settingsStyles,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ShelfObservationSettings extends KindSettings<ShelfObservationBlock> {
  protected readonly defaultCapHint = computed(() => {
    const { currency, locale } = this.money();
    return `Left empty, prices up to ${formatMoney(defaultShelfPriceCapMinor, currency, locale)} are accepted`;
  });

  protected setMeasure(measure: ShelfObservationBlock['measure']): void {
    this.patch({
      measure,
      periodDays: measure === 'units-sold' ? (this.block().periodDays ?? 7) : undefined,
    });
  }
}
