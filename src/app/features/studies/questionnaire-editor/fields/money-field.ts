import { ChangeDetectionStrategy, Component, computed, input, output, signal } from '@angular/core';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { formatMoney, minorToDecimalString } from '@shared/money/format-money';
import { minorUnitDigits } from '@shared/money/minor-unit-digits';
import { parseMoney } from '@shared/money/parse-money';
import type { MoneyContext } from './money-context';

/**
 * An amount typed as a decimal of the study's currency and held as integer minor units. What
 * cannot be read is explained under the field and passed on as no amount, so the questionnaire's
 * problem list shows it too. With `emptyHint` the amount is optional: an empty field is no
 * problem, and the hint says what applies instead.
 */
@Component({
  selector: 'app-money-field',
  imports: [MatFormFieldModule, MatInput],
  template: `
    <mat-form-field appearance="outline" subscriptSizing="dynamic">
      <mat-label>{{ label() }}</mat-label>
      <input
        matInput
        inputmode="decimal"
        autocomplete="off"
        [value]="shown()"
        [readonly]="readOnly()"
        (input)="read($any($event.target).value)"
      />
      <span matTextSuffix>{{ money().currency }}</span>
      @if (problem(); as message) {
        <mat-hint class="field-error">{{ message }}</mat-hint>
      } @else if (valueMinor() !== undefined) {
        <mat-hint>{{ formatted() }}</mat-hint>
      } @else if (emptyHint(); as hint) {
        <mat-hint>{{ hint }}</mat-hint>
      }
    </mat-form-field>
  `,
  styles: `
    mat-form-field {
      width: 100%;
    }
    .field-error {
      color: var(--mat-sys-error);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class MoneyField {
  readonly label = input.required<string>();
  readonly valueMinor = input<number | undefined>();
  readonly money = input.required<MoneyContext>();
  readonly readOnly = input(false);
  readonly emptyHint = input<string>();
  readonly valueMinorChange = output<number | undefined>();

  protected readonly problem = signal<string | null>(null);
  private readonly typed = signal<string | null>(null);

  /**
   * What the person typed while it still stands for the held amount; once the amount changes
   * from outside (a row removed above, a reload), the amount itself, written plainly.
   */
  protected readonly shown = computed(() => {
    const minor = this.valueMinor();
    const typed = this.typed();
    if (typed !== null && (minor === undefined || this.readMinor(typed) === minor)) return typed;
    return minor === undefined
      ? ''
      : minorToDecimalString(minor, minorUnitDigits(this.money().currency));
  });
  protected readonly formatted = computed(() => {
    const minor = this.valueMinor();
    const { currency, locale } = this.money();
    return minor === undefined || !Number.isSafeInteger(minor)
      ? ''
      : formatMoney(minor, currency, locale);
  });

  private readMinor(text: string): number | undefined {
    const parsed = parseMoney(text, this.money().currency, this.money().locale);
    return parsed.ok ? parsed.minor : undefined;
  }

  protected read(text: string): void {
    this.typed.set(text);
    if (text.trim() === '') {
      this.problem.set(this.emptyHint() === undefined ? 'Enter an amount' : null);
      this.valueMinorChange.emit(undefined);
      return;
    }
    const parsed = parseMoney(text, this.money().currency, this.money().locale);
    this.problem.set(parsed.ok ? null : parsed.message);
    this.valueMinorChange.emit(parsed.ok ? parsed.minor : undefined);
  }
}
