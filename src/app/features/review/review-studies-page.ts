import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatButton } from '@angular/material/button';
import { RouterLink } from '@angular/router';
import { catchError, of } from 'rxjs';
import { StudyCardList, loadStudies } from '../../shared/study-card-list';
import { ReviewApi } from './review-api';
import { pendingWords } from './review-words';

/** The studies the supervisor reviews, each with what waits for a decision there. */
@Component({
  selector: 'app-review-studies-page',
  imports: [MatButton, RouterLink, StudyCardList],
  template: `
    <div class="fc-page">
      <h1 class="fc-page__title">Review</h1>
      <p class="fc-page__lead">
        Interviews the quality checks flagged come first. Accept them, return them to the enumerator
        with a note, or reject them.
      </p>
      <app-study-card-list
        [loaded]="loaded()"
        [roles]="['supervisor']"
        emptyText="You supervise no study yet."
      >
        <ng-template let-study>
          <a mat-flat-button [routerLink]="['/review', study.id]">
            Open the review queue<span class="fc-visually-hidden"> of {{ study.name }}</span>
          </a>
          @if (pending(); as counts) {
            <span class="review-studies__pending">{{ pendingText(counts, study.id) }}</span>
          }
        </ng-template>
      </app-study-card-list>
    </div>
  `,
  styles: `
    .review-studies__pending {
      color: var(--mat-sys-on-surface-variant);
      font: var(--mat-sys-body-medium);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReviewStudiesPage {
  private readonly api = inject(ReviewApi);
  protected readonly loaded = loadStudies(this.api.studies());
  private readonly counts = toSignal(this.api.pending().pipe(catchError(() => of(null))));
  /** Counts by study; null while loading or when they could not be had (the list still works). */
  protected readonly pending = computed(() => {
    const counts = this.counts();
    return counts ? new Map(counts.map((count) => [count.studyId, count])) : null;
  });

  protected pendingText(
    counts: ReadonlyMap<string, { pending: number; flagged: number }>,
    studyId: string,
  ): string {
    const count = counts.get(studyId);
    return pendingWords(count?.pending ?? 0, count?.flagged ?? 0);
  }
}
