import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import type {
  SingleChoiceAnswer,
  SingleChoiceBlock,
} from '@shared/questionnaire/blocks/single-choice-block';

/** One option out of several, as large radio rows. */
@Component({
  selector: 'app-single-choice-block-view',
  template: `
    <ul class="bv-options" role="radiogroup" [attr.aria-labelledby]="labelledBy()">
      @for (option of block().options; track option.value) {
        <li role="none">
          <label class="bv-option">
            <input
              type="radio"
              [name]="block().id"
              [checked]="answer()?.value === option.value"
              (change)="answerChange.emit({ value: option.value })"
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
export class SingleChoiceBlockView {
  readonly block = input.required<SingleChoiceBlock>();
  readonly answer = input<SingleChoiceAnswer | undefined>();
  readonly labelledBy = input<string>('');
  readonly answerChange = output<SingleChoiceAnswer | undefined>();
}
