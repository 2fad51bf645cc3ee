import { ChangeDetectionStrategy, Component } from '@angular/core';
import type { MultipleChoiceBlock } from '@shared/questionnaire/blocks/multiple-choice-block';
import { NumberField } from '../fields/number-field';
import { KindSettings, settingsStyles } from './kind-settings';
import { OptionList } from './option-list';

/** Multiple choice: its options and how many may be chosen. */
@Component({
  selector: 'app-multiple-choice-settings',
  imports: [NumberField, OptionList],
  template: `
    <app-option-list
      [options]="block().options"
      [readOnly]="readOnly()"
      (optionsChange)="patch({ options: $event })"
    />
    <div class="pair">
      <app-number-field
        label="Fewest to choose"
        [value]="block().minChosen"
        [readOnly]="readOnly()"
        (valueChange)="patch({ minChosen: $any($event) })"
      />
      <app-number-field
        label="Most to choose"
        [value]="block().maxChosen"
        [readOnly]="readOnly()"
        (valueChange)="patch({ maxChosen: $any($event) })"
      />
    </div>
  `,
  styles: settingsStyles,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class MultipleChoiceSettings extends KindSettings<MultipleChoiceBlock> {}
