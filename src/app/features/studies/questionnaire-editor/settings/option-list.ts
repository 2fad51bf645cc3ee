import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { MatButton, MatIconButton } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatInput } from '@angular/material/input';
import type { ChoiceOption } from '@shared/questionnaire/choice-option';

/** The options of a choice: a label read out and a short value stored in the data. */
@Component({
  selector: 'app-option-list',
  imports: [MatButton, MatFormFieldModule, MatIcon, MatIconButton, MatInput],
  template: `
    <fieldset class="options">
      <legend>{{ legend() }}</legend>
      <ol class="options__list">
        @for (option of options(); track $index; let i = $index) {
          <li class="options__row">
            <mat-form-field appearance="outline" subscriptSizing="dynamic">
              <mat-label>Option {{ i + 1 }} label</mat-label>
              <input
                matInput
                [value]="option.label"
                [readonly]="readOnly()"
                (input)="change(i, { label: $any($event.target).value })"
              />
            </mat-form-field>
            <mat-form-field appearance="outline" subscriptSizing="dynamic" class="options__value">
              <mat-label>Stored as</mat-label>
              <input
                matInput
                [value]="option.value"
                [readonly]="readOnly()"
                (input)="change(i, { value: $any($event.target).value })"
              />
            </mat-form-field>
            @if (!readOnly()) {
              <button
                mat-icon-button
                type="button"
                (click)="remove(i)"
                [attr.aria-label]="'Remove option ' + (i + 1)"
              >
                <mat-icon>close</mat-icon>
              </button>
            }
          </li>
        }
      </ol>
      @if (!readOnly()) {
        <button mat-stroked-button type="button" (click)="add()">
          <mat-icon>add</mat-icon>Add option
        </button>
      }
    </fieldset>
  `,
  styles: `
    .options {
      border: 0;
      margin: 0;
      padding: 0;
      legend {
        font: var(--mat-sys-title-small);
        padding: 0 0 8px;
      }
    }
    .options__list {
      list-style: none;
      margin: 0 0 8px;
      padding: 0;
      display: grid;
      gap: 12px;
    }
    .options__row {
      display: grid;
      grid-template-columns: 1fr auto;
      gap: 8px 4px;
      align-items: start;
    }
    .options__value {
      grid-row: 2;
    }
    @media (min-width: 560px) {
      .options__row {
        grid-template-columns: 2fr 1fr auto;
      }
      .options__value {
        grid-row: auto;
      }
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class OptionList<O extends ChoiceOption = ChoiceOption> {
  readonly legend = input('Options');
  readonly options = input.required<readonly O[]>();
  readonly readOnly = input(false);
  /** Makes the row for a new option; plain options get a label and a value. */
  readonly makeOption = input<(index: number) => O>(
    (index) => ({ value: `option-${index + 1}`, label: `Option ${index + 1}` }) as O,
  );
  readonly optionsChange = output<O[]>();

  protected change(index: number, change: Partial<ChoiceOption>): void {
    this.optionsChange.emit(this.options().map((o, i) => (i === index ? { ...o, ...change } : o)));
  }

  protected remove(index: number): void {
    this.optionsChange.emit(this.options().filter((_, i) => i !== index));
  }

  protected add(): void {
    const taken = this.options().map((o) => o.value);
    let n = this.options().length;
    while (taken.includes(`option-${n + 1}`)) n++;
    this.optionsChange.emit([...this.options(), this.makeOption()(n)]);
  }
}
