import { ChangeDetectionStrategy, Component } from '@angular/core';
import { MatCheckbox } from '@angular/material/checkbox';
import type { TextBlock } from '@shared/questionnaire/blocks/text-block';
import { NumberField } from '../fields/number-field';
import { KindSettings, settingsStyles } from './kind-settings';

/** Text: the longest answer and whether it may run over several lines. */
@Component({
  selector: 'app-text-settings',
  imports: [MatCheckbox, NumberField],
  template: `
    <app-number-field
      label="Longest answer"
      suffix="characters"
      [value]="block().maxLength"
      [readOnly]="readOnly()"
      (valueChange)="patch({ maxLength: $any($event) })"
    />
    <mat-checkbox
      [checked]="block().multiline"
      [disabled]="readOnly()"
      (change)="patch({ multiline: $event.checked })"
    >
      Allow several lines
    </mat-checkbox>
  `,
  styles: settingsStyles,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class TextSettings extends KindSettings<TextBlock> {}
