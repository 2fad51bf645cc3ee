import { ChangeDetectionStrategy, Component } from '@angular/core';
import type { SingleChoiceBlock } from '@shared/questionnaire/blocks/single-choice-block';
import { KindSettings, settingsStyles } from './kind-settings';
import { OptionList } from './option-list';

/** Single choice: its options. */
@Component({
  selector: 'app-single-choice-settings',
  imports: [OptionList],
  template: `
    <app-option-list
      [options]="block().options"
      [readOnly]="readOnly()"
      (optionsChange)="patch({ options: $event })"
    />
  `,
  styles: settingsStyles,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SingleChoiceSettings extends KindSettings<SingleChoiceBlock> {}
