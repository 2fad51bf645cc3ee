import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { RouterLink } from '@angular/router';
import { StudyCardList, loadStudies } from '../../shared/study-card-list';
import { ReviewApi } from './review-api';

/** The studies the supervisor reviews; one study's queue opens from here. */
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
        </ng-template>
      </app-study-card-list>
    </div>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReviewStudiesPage {
  protected readonly loaded = loadStudies(inject(ReviewApi).studies());
}
