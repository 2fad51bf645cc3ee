import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import type {
  MultipleChoiceAnswer,
  MultipleChoiceBlock,
} from '@shared/questionnaire/blocks/multiple-choice-block';

/** Several options, as large check rows; the answer keeps the options' order. */
@Component({
  selector: 'app-multiple-choice-block-view',
  template: `
    <p class="bv-hint">{{ hint() }}</p>
    <ul class="bv-options" role="group" [attr.aria-labelledby]="labelledBy()">
      @for (option of block().options; track option.value) {
        <li role="none">
          <label class="bv-option">
            <input
              type="checkbox"
              [checked]="isChosen(option.value)"
              (change)="toggle(option.value, $any($event.target).checked)"
            />
            {{ option.label }}
          </label>
        </li>
      }
    </ul>
  `,
  styleUrl: './block-view.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class MultipleChoiceBlockView {
  readonly block = input.required<MultipleChoiceBlock>();
  readonly answer = input<MultipleChoiceAnswer | undefined>();
  readonly labelledBy = input<string>('');
  readonly answerChange = output<MultipleChoiceAnswer | undefined>();

  protected readonly hint = computed(() => {
    const { minChosen, maxChosen } = this.block();
    return minChosen === maxChosen
      ? `Choose ${minChosen}.`
      : `Choose from ${minChosen} to ${maxChosen}.`;
  });

  protected isChosen(value: string): boolean {
    return this.answer()?.values.includes(value) ?? false;
  }

  protected toggle(value: string, chosen: boolean): void {
    const held = new Set(this.answer()?.values ?? []);
    if (chosen) held.add(value);
    else held.delete(value);
    const values = this.block()
      .options.map((option) => option.value)
      .filter((v) => held.has(v));
    this.answerChange.emit(values.length > 0 ? { values } : undefined);
  }
}
