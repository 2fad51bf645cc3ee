import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatButton } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatIcon } from '@angular/material/icon';
import { MatProgressBar } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import type { Study } from '@shared/studies/study';
import { catchError, map, of } from 'rxjs';
import { readApiProblem } from '../../core/api-problem';
import { AnalysisApi } from './analysis-api';

type StudiesState =
  | { readonly status: 'loading' }
  | { readonly status: 'loaded'; readonly studies: readonly Study[] }
  | { readonly status: 'failed'; readonly message: string };

/** The studies a researcher can analyse, each opening its workspace. */
@Component({
  selector: 'app-analysis-studies-page',
  imports: [MatButton, MatCardModule, MatIcon, MatProgressBar, RouterLink],
  template: `
    <div class="fc-page">
      <h1 class="fc-page__title">Analysis</h1>
      <p class="fc-page__lead">
        Fit demand models to a study’s accepted interviews, compare the methods, simulate price
        policies and publish a demand schedule for the study’s clients.
      </p>
      @switch (state().status) {
        @case ('loading') {
          <mat-progress-bar mode="indeterminate" aria-label="Loading studies" />
        }
        @case ('failed') {
          <p class="studies__problem" role="alert">{{ problem() }}</p>
        }
        @default {
          <ul class="studies" aria-label="Studies you analyse">
            @for (study of studies(); track study.id) {
              <li>
                <mat-card appearance="outlined" class="studies__card">
                  <mat-card-header>
                    <mat-card-title
                      ><h2 class="studies__name">{{ study.name }}</h2></mat-card-title
                    >
                    <mat-card-subtitle
                      >{{ study.productName }} · {{ study.market }}</mat-card-subtitle
                    >
                  </mat-card-header>
                  <mat-card-actions>
                    <a mat-flat-button [routerLink]="[study.id]">
                      <mat-icon>query_stats</mat-icon>
                      Open workspace
                    </a>
                  </mat-card-actions>
                </mat-card>
              </li>
            } @empty {
              <li class="studies__empty">
                No study names you as a researcher yet. A study’s researcher can add you.
              </li>
            }
          </ul>
        }
      }
    </div>
  `,
  styles: `
    .studies {
      list-style: none;
      margin: 0;
      padding: 0;
      display: grid;
      gap: 16px;
      grid-template-columns: repeat(auto-fill, minmax(min(100%, 22rem), 1fr));
    }
    .studies__name {
      font: inherit;
      margin: 0;
    }
    .studies__problem {
      color: var(--mat-sys-error);
    }
    .studies__empty {
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AnalysisStudiesPage {
  protected readonly state = toSignal(
    inject(AnalysisApi)
      .listStudies()
      .pipe(
        map(
          (studies): StudiesState => ({
            status: 'loaded',
            studies: studies.filter((s) => s.myRoles.includes('researcher')),
          }),
        ),
        catchError((error: unknown) =>
          of<StudiesState>({ status: 'failed', message: readApiProblem(error).message }),
        ),
      ),
    { initialValue: { status: 'loading' } as StudiesState },
  );
  protected readonly studies = computed(() => {
    const state = this.state();
    return state.status === 'loaded' ? state.studies : [];
  });
  protected readonly problem = computed(() => {
    const state = this.state();
    return state.status === 'failed' ? state.message : '';
  });
}
