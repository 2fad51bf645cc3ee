import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatSelectModule } from '@angular/material/select';
import { analysisMethodLabels } from '@shared/analysis/analysis-method';
import type { FitSummary } from '@shared/analysis/fit-resource';

/** Chooses one of the study's finished fits. */
@Component({
  selector: 'app-fit-picker',
  imports: [DatePipe, MatFormFieldModule, MatSelectModule],
  template: `
    <mat-form-field class="picker" subscriptSizing="dynamic">
      <mat-label>{{ label() }}</mat-label>
      <mat-select [value]="selected()" (valueChange)="picked.emit($event)">
        @for (fit of fits(); track fit.id) {
          <mat-option [value]="fit.id">
            {{ methodLabels[fit.spec.method] }} · n = {{ fit.n }} ·
            {{ fit.createdAt | date: 'd MMM, HH:mm' }}
          </mat-option>
        }
      </mat-select>
    </mat-form-field>
  `,
  styles: `
    .picker {
      width: 100%;
      max-width: 40rem;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class FitPicker {
  readonly fits = input.required<readonly FitSummary[]>();
  readonly selected = input<string | null>(null);
  readonly label = input('Fit');
  readonly picked = output<string>();
  protected readonly methodLabels = analysisMethodLabels;
}
