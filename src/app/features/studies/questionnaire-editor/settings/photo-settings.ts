import { ChangeDetectionStrategy, Component } from '@angular/core';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import type { PhotoBlock } from '@shared/questionnaire/blocks/photo-block';
import { NumberField } from '../fields/number-field';
import { KindSettings, settingsStyles } from './kind-settings';

/** Photo: what to photograph and how many pictures. */
@Component({
  selector: 'app-photo-settings',
  imports: [MatFormFieldModule, MatInput, NumberField],
  template: `
    <mat-form-field appearance="outline">
      <mat-label>What to photograph</mat-label>
      <input
        matInput
        [value]="block().subject"
        [readonly]="readOnly()"
        (input)="patch({ subject: $any($event.target).value })"
      />
      <mat-hint>Price tags, shelves and packs — never people</mat-hint>
    </mat-form-field>
    <app-number-field
      label="Most photos"
      [value]="block().maxPhotos"
      [readOnly]="readOnly()"
      (valueChange)="patch({ maxPhotos: $any($event) })"
    />
  `,
  styles: settingsStyles,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PhotoSettings extends KindSettings<PhotoBlock> {}
