import {
  ChangeDetectionStrategy,
  Component,
  ElementRef,
  input,
  output,
  signal,
  viewChild,
} from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { maxRespondentReferenceLength } from '@shared/field-sync/respondent-key';

/**
 * The optional respondent reference beside consent: something that tells a respondent apart
 * without naming them. The typed text lives in the input only; every change goes out at once
 * to be hashed, and the runner keeps the code, never the text.
 */
@Component({
  selector: 'app-respondent-reference',
  imports: [MatButton, MatIcon],
  template: `
    <div class="reference">
      <label class="reference__label" for="respondent-reference">
        Respondent reference (optional)
      </label>
      <p id="respondent-reference-hint" class="reference__hint">
        Once they agree, ask for something that tells them apart without a name: a phone number, or
        the household or stall code. This phone keeps only a one-way code made from it, to spot the
        same respondent interviewed twice; what you type is never saved or sent as typed.
      </p>
      <input
        #field
        id="respondent-reference"
        class="reference__input"
        type="text"
        autocomplete="off"
        autocapitalize="off"
        spellcheck="false"
        enterkeyhint="done"
        [attr.maxlength]="maxLength"
        [attr.aria-invalid]="problem() ? true : null"
        aria-describedby="respondent-reference-hint respondent-reference-state"
        (input)="passOn(field.value)"
      />
      <p
        id="respondent-reference-state"
        class="reference__state"
        [class.reference__state--problem]="problem()"
        aria-live="polite"
      >
        @if (problem(); as message) {
          {{ message }}
        } @else if (kept()) {
          <mat-icon aria-hidden="true">lock</mat-icon> Kept as a one-way code.
          @if (empty()) {
            Type again to replace it.
          }
        } @else {
          No reference kept.
        }
      </p>
      @if (kept()) {
        <button mat-button type="button" class="reference__remove" (click)="removeReference()">
          Remove the reference
        </button>
      }
    </div>
  `,
  styles: `
    @use '../../field-blocks/field-input';

    .reference {
      display: grid;
      gap: 6px;
      margin-top: 24px;
      padding-top: 16px;
      border-top: 1px solid var(--mat-sys-outline-variant);
    }
    .reference__label {
      font: var(--mat-sys-title-medium);
    }
    .reference__hint,
    .reference__state {
      margin: 0;
      font: var(--mat-sys-body-medium);
      color: var(--mat-sys-on-surface-variant);
    }
    .reference__state {
      display: flex;
      align-items: center;
      gap: 6px;
      min-height: 24px;
    }
    .reference__state--problem {
      color: var(--mat-sys-error);
    }
    .reference__input {
      @include field-input.field-input(56px);
    }
    .reference__input[aria-invalid='true'] {
      border-color: var(--mat-sys-error);
    }
    .reference__remove {
      justify-self: start;
      min-height: 48px;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RespondentReference {
  /** Whether the draft holds a respondent key. */
  readonly kept = input(false);
  readonly problem = input<string | null>(null);
  /** Every change of the typed text; empty when cleared. */
  readonly referenceChange = output<string>();

  protected readonly maxLength = maxRespondentReferenceLength;
  /** Whether the input is empty — the only thing kept here of what was typed. */
  protected readonly empty = signal(true);
  private readonly field = viewChild.required<ElementRef<HTMLInputElement>>('field');

  protected passOn(typed: string): void {
    this.empty.set(typed === '');
    this.referenceChange.emit(typed);
  }

  protected removeReference(): void {
    const field = this.field().nativeElement;
    field.value = '';
    this.passOn('');
    field.focus();
  }
}
