import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import type { NumberAnswer, NumberBlock } from '@shared/questionnaire/blocks/number-block';

/** A number typed on the numeric keypad, with its unit and range shown. */
@Component({
  selector: 'app-number-block-view',
  template: `
    <label class="bv-field">
      <span class="fc-visually-hidden">Answer</span>
      <input
        class="bv-input"
        type="number"
        [attr.inputmode]="block().wholeNumber ? 'numeric' : 'decimal'"
        [attr.aria-labelledby]="labelledBy() || null"
        [attr.min]="block().min ?? null"
        [attr.max]="block().max ?? null"
        [attr.step]="block().wholeNumber ? 1 : 'any'"
        [value]="answer()?.value ?? ''"
        (input)="read($any($event.target).value)"
      />
      @if (range(); as text) {
        <span class="bv-hint">{{ text }}</span>
      }
    </label>
  `,
  styleUrl: './block-view.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NumberBlockView {
  readonly block = input.required<NumberBlock>();
  readonly answer = input<NumberAnswer | undefined>();
  readonly labelledBy = input<string>('');
  readonly answerChange = output<NumberAnswer | undefined>();

  protected readonly range = computed(() => {
    const { min, max, unit } = this.block();
    const suffix = unit ? ` ${unit}` : '';
    if (min !== undefined && max !== undefined) return `From ${min} to ${max}${suffix}`;
    if (min !== undefined) return `At least ${min}${suffix}`;
    if (max !== undefined) return `At most ${max}${suffix}`;
    return unit ? `In ${unit}` : null;
  });

  protected read(text: string): void {
    const value = text.trim() === '' ? NaN : Number(text);
    this.answerChange.emit(Number.isFinite(value) ? { value } : undefined);
  }
}
