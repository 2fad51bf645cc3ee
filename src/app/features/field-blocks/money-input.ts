import {
  ChangeDetectionStrategy,
  Component,
  DestroyRef,
  computed,
  inject,
  input,
  output,
  signal,
} from '@angular/core';
import { minorToDecimalString } from '@shared/money/format-money';
import { minorUnitDigits } from '@shared/money/minor-unit-digits';
import { parseMoney } from '@shared/money/parse-money';
import { TypingProblems } from './typing-problems';

let nextId = 0;

/**
 * An amount typed as the respondent says it ("1,250.50") and read in the study's locale into
 * integer minor units; a typing mistake is explained under the field rather than guessed at,
 * and noted (when the screen keeps a `TypingProblems`) for the answer `part` it was meant for.
 */
@Component({
  selector: 'app-money-input',
  template: `
    <label class="bv-field">
      <span>{{ label() }} ({{ currency() }})</span>
      <input
        class="bv-input"
        type="text"
        inputmode="decimal"
        autocomplete="off"
        [attr.aria-describedby]="problem() ? errorId : null"
        [attr.aria-invalid]="problem() ? true : null"
        [value]="shown()"
        (input)="read($any($event.target).value)"
      />
      @if (problem(); as message) {
        <span class="bv-error" [id]="errorId">{{ message }}</span>
      }
    </label>
  `,
  styleUrl: './block-view.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class MoneyInput {
  readonly label = input.required<string>();
  /** The part of the answer this amount fills (`amountMinor`), and its name in messages. */
  readonly part = input<string>('');
  readonly name = input<string>('');
  readonly valueMinor = input<number | null | undefined>();
  readonly currency = input.required<string>();
  readonly locale = input.required<string>();
  readonly valueMinorChange = output<number | undefined>();

  protected readonly errorId = `money-error-${nextId++}`;
  protected readonly problem = signal<string | null>(null);
  private readonly typed = signal<string | null>(null);
  private readonly typingProblems = inject(TypingProblems, { optional: true });

  constructor() {
    inject(DestroyRef).onDestroy(() => this.typingProblems?.note(this.part(), null));
  }

  /** What the person typed, or the stored amount written plainly when they have typed nothing. */
  protected readonly shown = computed(() => {
    const typed = this.typed();
    if (typed !== null) return typed;
    const minor = this.valueMinor();
    // A template's `answer()?.x` gives null, not undefined, when there is no answer yet.
    return minor === undefined || minor === null
      ? ''
      : minorToDecimalString(minor, minorUnitDigits(this.currency()));
  });

  protected read(text: string): void {
    this.typed.set(text);
    const parsed = text.trim() === '' ? null : parseMoney(text, this.currency(), this.locale());
    const problem = parsed && !parsed.ok ? parsed.message : null;
    this.problem.set(problem);
    this.typingProblems?.note(this.part(), problem && `${this.name() || this.label()}: ${problem}`);
    this.valueMinorChange.emit(parsed?.ok ? parsed.minor : undefined);
  }
}
