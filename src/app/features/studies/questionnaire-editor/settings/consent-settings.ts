import { ChangeDetectionStrategy, Component } from '@angular/core';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import type { ConsentBlock } from '@shared/questionnaire/blocks/consent-block';
import { KindSettings, settingsStyles } from './kind-settings';

/** Consent: the statement read before anything is asked. */
@Component({
  selector: 'app-consent-settings',
  imports: [MatFormFieldModule, MatInput],
  template: `
    <mat-form-field appearance="outline">
      <mat-label>Consent statement</mat-label>
      <textarea
        matInput
        rows="4"
        [value]="block().statement"
        [readonly]="readOnly()"
        (input)="patch({ statement: $any($event.target).value })"
      ></textarea>
      <mat-hint
        >What the respondent agrees to; it is always asked first and always required</mat-hint
      >
    </mat-form-field>
  `,
  styles: settingsStyles,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ConsentSettings extends KindSettings<ConsentBlock> {}
