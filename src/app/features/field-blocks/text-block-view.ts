import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import type { TextAnswer, TextBlock } from '@shared/questionnaire/blocks/text-block';

/** A free answer on one line or several, with the characters left shown. */
@Component({
  selector: 'app-text-block-view',
  template: `
    <div class="bv-field">
      @if (block().multiline) {
        <textarea
          class="bv-input"
          rows="4"
          [attr.aria-labelledby]="labelledBy() || null"
          [attr.maxlength]="block().maxLength"
          [value]="answer()?.value ?? ''"
          (input)="read($any($event.target).value)"
        ></textarea>
      } @else {
        <input
          class="bv-input"
          type="text"
          [attr.aria-labelledby]="labelledBy() || null"
          [attr.maxlength]="block().maxLength"
          [value]="answer()?.value ?? ''"
          (input)="read($any($event.target).value)"
        />
      }
      <span class="bv-hint">
        {{ block().maxLength - (answer()?.value?.length ?? 0) }} characters left
      </span>
    </div>
  `,
  styleUrl: './block-view.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class TextBlockView {
  readonly block = input.required<TextBlock>();
  readonly answer = input<TextAnswer | undefined>();
  readonly labelledBy = input<string>('');
  readonly answerChange = output<TextAnswer | undefined>();

  protected read(text: string): void {
    this.answerChange.emit(text.trim() === '' ? undefined : { value: text });
  }
}
