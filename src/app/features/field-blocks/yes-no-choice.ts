import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';

let nextGroup = 0;

/** A yes/no pair of large radio buttons, labelled by the question it answers. */
@Component({
  selector: 'app-yes-no-choice',
  template: `
    <div class="bv-choice-pair" role="radiogroup" [attr.aria-labelledby]="labelledBy()">
      @for (option of options; track option.value) {
        <label class="bv-option">
          <input
            type="radio"
            [name]="name"
            [value]="option.value"
            [checked]="value() === option.value"
            (change)="valueChange.emit(option.value)"
          />
          {{ option.label }}
        </label>
      }
    </div>
  `,
  styleUrl: './block-view.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class YesNoChoice {
  readonly value = input<'yes' | 'no' | undefined>();
  readonly labelledBy = input.required<string>();
  readonly valueChange = output<'yes' | 'no'>();

  protected readonly name = `yes-no-${nextGroup++}`;
  protected readonly options = [
    { value: 'yes', label: 'Yes' },
    { value: 'no', label: 'No' },
  ] as const;
}
