import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { MatProgressBar } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import type { FitResource } from '@shared/analysis/fit-resource';
import { sampleCount } from '../results/fit-sample-size';

/** Where the fit job started from this screen stands, said in words and with a bar. */
@Component({
  selector: 'app-fit-job-progress',
  imports: [MatButton, MatIcon, MatProgressBar, RouterLink],
  template: `
    <div class="job" role="status" aria-live="polite">
      @switch (job().status) {
        @case ('queued') {
          <p>Waiting for a worker to take the fit…</p>
          <mat-progress-bar mode="indeterminate" aria-label="Fit waiting in the queue" />
        }
        @case ('running') {
          <p>Fitting: {{ job().progress }} %</p>
          <mat-progress-bar mode="determinate" [value]="job().progress" aria-label="Fit progress" />
        }
        @case ('done') {
          <p class="job__done">
            <mat-icon aria-hidden="true">task_alt</mat-icon>
            Fit finished on {{ sample() }}.
          </p>
          <a mat-flat-button routerLink="../results">See the results</a>
        }
        @case ('failed') {
          <p class="job__failed">
            <mat-icon aria-hidden="true">error</mat-icon>
            The fit failed: {{ job().error?.message ?? 'no reason was given' }}
          </p>
        }
      }
    </div>
  `,
  styles: `
    .job {
      display: grid;
      gap: 8px;
      justify-items: start;
      p {
        margin: 0;
        display: flex;
        align-items: center;
        gap: 8px;
      }
    }
    mat-progress-bar {
      width: 100%;
    }
    mat-icon {
      flex: none;
    }
    .job__failed {
      color: var(--mat-sys-error);
    }
    .job__done {
      color: var(--mat-sys-primary);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class FitJobProgress {
  readonly job = input.required<FitResource>();
  protected readonly sample = computed(() =>
    sampleCount(this.job().spec, this.job().result?.n ?? 0),
  );
}
