import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';

/** A plain number setting (days, people, metres); an empty field is passed on as no value. */
@Component({
  selector: 'app-number-field',
  imports: [MatFormFieldModule, MatInput],
  template: `
    <mat-form-field appearance="outline" subscriptSizing="dynamic">
      <mat-label>{{ label() }}</mat-label>
      <input
        matInput
        type="number"
        [attr.inputmode]="whole() ? 'numeric' : 'decimal'"
        [attr.min]="min()"
        [value]="value() ?? ''"
        [readonly]="readOnly()"
        (input)="read($any($event.target).value)"
      />
      @if (suffix()) {
        <span matTextSuffix>{{ suffix() }}</span>
      }
      @if (hint()) {
        <mat-hint>{{ hint() }}</mat-hint>
      }
    </mat-form-field>
  `,
  styles: `
    mat-form-field {
      width: 100%;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NumberField {
  readonly label = input.required<string>();
  readonly value = input<number | undefined>();
  readonly suffix = input('');
  readonly hint = input('');
  readonly whole = input(true);
  readonly min = input<number | null>(null);
  readonly readOnly = input(false);
  readonly valueChange = output<number | undefined>();

  protected read(text: string): void {
    const value = text.trim() === '' ? undefined : Number(text);
    this.valueChange.emit(value === undefined || Number.isNaN(value) ? undefined : value);
  }
}
