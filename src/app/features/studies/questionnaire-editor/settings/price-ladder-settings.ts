import { ChangeDetectionStrategy, Component } from '@angular/core';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatSelectModule } from '@angular/material/select';
import type { PriceLadderBlock } from '@shared/questionnaire/blocks/price-ladder-block';
import { AmountList } from '../fields/amount-list';
import { KindSettings, settingsStyles } from './kind-settings';

/** Price ladder: its prices, the order they are put in, and the answer scale. */
@Component({
  selector: 'app-price-ladder-settings',
  imports: [AmountList, MatFormFieldModule, MatSelectModule],
  template: `
    <app-amount-list
      legend="Prices, lowest first"
      noun="Price"
      [amounts]="block().pricesMinor"
      [money]="money()"
      [readOnly]="readOnly()"
      (amountsChange)="patch({ pricesMinor: $any($event) })"
    />
    <div class="pair">
      <mat-form-field appearance="outline">
        <mat-label>Order asked</mat-label>
        <mat-select
          [value]="block().order"
          [disabled]="readOnly()"
          (valueChange)="patch({ order: $event })"
        >
          <mat-option value="ascending">Lowest price first</mat-option>
          <mat-option value="descending">Highest price first</mat-option>
          <mat-option value="random-start">From a random price, going round</mat-option>
        </mat-select>
      </mat-form-field>
      <mat-form-field appearance="outline">
        <mat-label>Answer scale</mat-label>
        <mat-select
          [value]="block().scale"
          [disabled]="readOnly()"
          (valueChange)="patch({ scale: $event })"
        >
          <mat-option value="yes-no">Yes or no</mat-option>
          <mat-option value="intent-5">Intent from 1 to 5</mat-option>
        </mat-select>
      </mat-form-field>
    </div>
  `,
  styles: settingsStyles,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PriceLadderSettings extends KindSettings<PriceLadderBlock> {}
