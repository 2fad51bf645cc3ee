import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatButton } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { RouterLink } from '@angular/router';
import { catchError, map, of } from 'rxjs';
import type { Study } from '@shared/studies/study';
import { readApiProblem } from '../../core/api-problem';
import { ReviewApi } from './review-api';

type Loaded = { studies: Study[]; problem: null } | { studies: []; problem: string };

/** The studies the supervisor reviews; one study's queue opens from here. */
@Component({
  selector: 'app-review-studies-page',
  imports: [MatButton, MatCardModule, RouterLink],
  template: `
    <div class="fc-page">
      <h1 class="fc-page__title">Review</h1>
      <p class="fc-page__lead">
        Interviews the quality checks flagged come first. Accept them, return them to the enumerator
        with a note, or reject them.
      </p>
      @if (loaded(); as result) {
        @if (result.problem) {
          <p role="alert">{{ result.problem }}</p>
        } @else if (studies().length === 0) {
          <p>You supervise no study yet.</p>
        }
        <ul class="review-studies">
          @for (study of studies(); track study.id) {
            <li>
              <mat-card appearance="outlined">
                <mat-card-header>
                  <h2 matCardTitle>{{ study.name }}</h2>
                  <p matCardSubtitle>{{ study.productName }} · {{ study.market }}</p>
                </mat-card-header>
                <mat-card-actions>
                  <a
                    mat-flat-button
                    class="review-studies__open"
                    [routerLink]="['/review', study.id]"
                  >
                    Open the review queue<span class="fc-visually-hidden">
                      of {{ study.name }}</span
                    >
                  </a>
                </mat-card-actions>
              </mat-card>
            </li>
          }
        </ul>
      }
    </div>
  `,
  styles: `
    .review-studies {
      list-style: none;
      margin: 0;
      padding: 0;
      display: grid;
      gap: 12px;
    }
    h2 {
      margin: 0;
      font: var(--mat-sys-title-large);
    }
    .review-studies__open {
      min-height: 48px;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReviewStudiesPage {
  protected readonly loaded = toSignal(
    inject(ReviewApi)
      .studies()
      .pipe(
        map((studies): Loaded => ({ studies, problem: null })),
        catchError((error: unknown) =>
          of<Loaded>({ studies: [], problem: readApiProblem(error).message }),
        ),
      ),
  );
  protected readonly studies = computed(() =>
    (this.loaded()?.studies ?? []).filter((study) => study.myRoles.includes('supervisor')),
  );
}
