import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { RouterLink } from '@angular/router';
import { StudyCardList, loadStudies } from '../../shared/study-card-list';
import { FieldPlanningApi } from './field-planning-api';

/** The studies whose field work the person plans (supervisor) or follows (researcher). */
@Component({
  selector: 'app-planning-studies-page',
  imports: [MatButton, RouterLink, StudyCardList],
  template: `
    <div class="fc-page">
      <h1 class="fc-page__title">Field planning</h1>
      <p class="fc-page__lead">
        Upload each study's sampling points, group them into routes with a quota per point, assign
        the routes to enumerators and follow the interviews as they sync.
      </p>
      <app-study-card-list
        [loaded]="loaded()"
        [roles]="['supervisor', 'researcher']"
        emptyText="You are not a supervisor or researcher of any study yet."
      >
        <ng-template let-study>
          <a mat-flat-button [routerLink]="['/field-planning', study.id, 'points']">
            Points and routes<span class="fc-visually-hidden"> of {{ study.name }}</span>
          </a>
          <a mat-stroked-button [routerLink]="['/field-planning', study.id, 'progress']">
            Progress<span class="fc-visually-hidden"> of {{ study.name }}</span>
          </a>
        </ng-template>
      </app-study-card-list>
    </div>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PlanningStudiesPage {
  protected readonly loaded = loadStudies(inject(FieldPlanningApi).studies());
}
