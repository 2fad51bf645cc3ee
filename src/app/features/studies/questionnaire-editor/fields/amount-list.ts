import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { MatButton, MatIconButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import type { MoneyContext } from './money-context';
import { MoneyField } from './money-field';

/**
 * An increasing list of amounts (ladder prices, card amounts): edit each, add one above the
 * last, remove any. Order is checked by the shared rules, which name the amount out of place.
 */
@Component({
  selector: 'app-amount-list',
  imports: [MatButton, MatIcon, MatIconButton, MoneyField],
  template: `
    <fieldset class="amounts">
      <legend>{{ legend() }}</legend>
      <ol class="amounts__list">
        @for (amount of amounts(); track $index; let i = $index) {
          <li class="amounts__row">
            <app-money-field
              [label]="noun() + ' ' + (i + 1)"
              [valueMinor]="amount"
              [money]="money()"
              [readOnly]="readOnly()"
              (valueMinorChange)="replace(i, $event)"
            />
            @if (!readOnly()) {
              <button
                mat-icon-button
                type="button"
                (click)="removeAt(i)"
                [attr.aria-label]="'Remove ' + noun().toLowerCase() + ' ' + (i + 1)"
              >
                <mat-icon>close</mat-icon>
              </button>
            }
          </li>
        }
      </ol>
      @if (!readOnly()) {
        <button mat-stroked-button type="button" (click)="addAmount()">
          <mat-icon>add</mat-icon>Add {{ noun().toLowerCase() }}
        </button>
      }
    </fieldset>
  `,
  styles: `
    .amounts {
      border: 0;
      margin: 0;
      padding: 0;
      legend {
        font: var(--mat-sys-title-small);
        padding: 0 0 8px;
      }
    }
    .amounts__list {
      list-style: none;
      margin: 0 0 8px;
      padding: 0;
      display: grid;
      gap: 12px;
    }
    .amounts__row {
      display: grid;
      grid-template-columns: 1fr auto;
      align-items: start;
      gap: 4px;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AmountList {
  readonly legend = input.required<string>();
  readonly noun = input.required<string>();
  readonly amounts = input.required<readonly (number | undefined)[]>();
  readonly money = input.required<MoneyContext>();
  readonly readOnly = input(false);
  readonly amountsChange = output<(number | undefined)[]>();

  protected replace(index: number, value: number | undefined): void {
    this.amountsChange.emit(this.amounts().map((amount, i) => (i === index ? value : amount)));
  }

  protected removeAt(index: number): void {
    this.amountsChange.emit(this.amounts().filter((_, i) => i !== index));
  }

  /** A new amount one step above the last (the last step repeated), so the list stays increasing. */
  protected addAmount(): void {
    const list = this.amounts().filter((a): a is number => a !== undefined);
    const last = list.at(-1) ?? 0;
    const step = list.length >= 2 ? last - list[list.length - 2] : Math.max(last, 100);
    this.amountsChange.emit([...this.amounts(), last + Math.max(step, 1)]);
  }
}
