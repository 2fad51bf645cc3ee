import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input, output } from '@angular/core';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatSelectModule } from '@angular/material/select';
import { analysisMethodLabels } from '@shared/analysis/analysis-method';
import type { FitSummary } from '@shared/analysis/fit-resource';
import { AnalysisWorkspaceState } from '../analysis-workspace-state';
import { fitDistinctions } from './fit-distinctions';

/**
 * Chooses one of the study's finished fits. Under each method, n and time a second line says
 * what sets the fit apart (model options, interviews, weighting), since two fits of one method
 * on the same data otherwise read alike.
 */
@Component({
  selector: 'app-fit-picker',
  imports: [DatePipe, MatFormFieldModule, MatSelectModule],
  template: `
    <mat-form-field class="picker" subscriptSizing="dynamic">
      <mat-label>{{ label() }}</mat-label>
      <mat-select [value]="selected()" (valueChange)="picked.emit($event)">
        <mat-select-trigger>
          @if (selectedFit(); as fit) {
            {{ methodLabels[fit.spec.method] }} · n = {{ fit.n }} ·
            {{ fit.createdAt | date: 'd MMM, HH:mm' }}
          }
        </mat-select-trigger>
        @for (fit of fits(); track fit.id) {
          <mat-option [value]="fit.id" class="fit-option">
            <span class="fit-option__title"
              >{{ methodLabels[fit.spec.method] }} · n = {{ fit.n }} ·
              {{ fit.createdAt | date: 'd MMM, HH:mm' }}</span
            >
            <span class="fit-option__details">{{ distinctions().get(fit.id) }}</span>
          </mat-option>
        }
      </mat-select>
    </mat-form-field>
    @if (selectedDetails(); as details) {
      <p class="picker__details">{{ details }}</p>
    }
  `,
  styles: `
    .picker {
      width: 100%;
      max-width: 40rem;
    }
    .picker__details {
      margin: 4px 0 0;
      max-width: 40rem;
      font: var(--mat-sys-body-small);
      color: var(--mat-sys-on-surface-variant);
    }
    .fit-option__title,
    .fit-option__details {
      display: block;
    }
    .fit-option__details {
      font: var(--mat-sys-body-small);
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class FitPicker {
  private readonly state = inject(AnalysisWorkspaceState, { optional: true });

  readonly fits = input.required<readonly FitSummary[]>();
  readonly selected = input<string | null>(null);
  readonly label = input('Fit');
  readonly picked = output<string>();
  protected readonly methodLabels = analysisMethodLabels;

  protected readonly distinctions = computed(() =>
    fitDistinctions(this.fits(), this.state?.format() ?? null),
  );
  protected readonly selectedFit = computed(
    () => this.fits().find((fit) => fit.id === this.selected()) ?? null,
  );
  protected readonly selectedDetails = computed(() => {
    const fit = this.selectedFit();
    return fit ? (this.distinctions().get(fit.id) ?? null) : null;
  });
}
