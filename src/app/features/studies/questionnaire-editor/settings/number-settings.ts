import { ChangeDetectionStrategy, Component } from '@angular/core';
import { MatCheckbox } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import type { NumberBlock } from '@shared/questionnaire/blocks/number-block';
import { NumberField } from '../fields/number-field';
import { KindSettings, settingsStyles } from './kind-settings';

/** Number: the range, whole numbers or not, and a unit label. */
@Component({
  selector: 'app-number-settings',
  imports: [MatCheckbox, MatFormFieldModule, MatInput, NumberField],
  template: `
    <div class="pair">
      <app-number-field
        label="Smallest (optional)"
        [whole]="false"
        [value]="block().min"
        [readOnly]="readOnly()"
        (valueChange)="patch({ min: $event })"
      />
      <app-number-field
        label="Largest (optional)"
        [whole]="false"
        [value]="block().max"
        [readOnly]="readOnly()"
        (valueChange)="patch({ max: $event })"
      />
    </div>
    <mat-form-field appearance="outline">
      <mat-label>Unit (optional)</mat-label>
      <input
        matInput
        [value]="block().unit ?? ''"
        [readonly]="readOnly()"
        (input)="patch({ unit: $any($event.target).value || undefined })"
      />
    </mat-form-field>
    <mat-checkbox
      [checked]="block().wholeNumber"
      [disabled]="readOnly()"
      (change)="patch({ wholeNumber: $event.checked })"
    >
      Whole numbers only
    </mat-checkbox>
  `,
  styles: settingsStyles,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NumberSettings extends KindSettings<NumberBlock> {}
