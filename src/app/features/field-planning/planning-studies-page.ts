import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatButton } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { RouterLink } from '@angular/router';
import { catchError, map, of } from 'rxjs';
import type { Study } from '@shared/studies/study';
import { readApiProblem } from '../../core/api-problem';
import { FieldPlanningApi } from './field-planning-api';

type Loaded = { studies: Study[]; problem: null } | { studies: []; problem: string };

/** The studies whose field work the person plans (supervisor) or follows (researcher). */
@Component({
  selector: 'app-planning-studies-page',
  imports: [MatButton, MatCardModule, RouterLink],
  template: `
    <div class="fc-page">
      <h1 class="fc-page__title">Field planning</h1>
      <p class="fc-page__lead">
        Upload each study's sampling points, group them into routes with a quota per point, assign
        the routes to enumerators and follow the interviews as they sync.
      </p>
      @if (loaded(); as result) {
        @if (result.problem) {
          <p role="alert">{{ result.problem }}</p>
        } @else if (studies().length === 0) {
          <p>You are not a supervisor or researcher of any study yet.</p>
        }
        <ul class="planning-studies">
          @for (study of studies(); track study.id) {
            <li>
              <mat-card appearance="outlined">
                <mat-card-header>
                  <h2 matCardTitle>{{ study.name }}</h2>
                  <p matCardSubtitle>{{ study.productName }} · {{ study.market }}</p>
                </mat-card-header>
                <mat-card-actions class="planning-studies__actions">
                  <a mat-flat-button [routerLink]="['/field-planning', study.id, 'points']">
                    Points and routes<span class="fc-visually-hidden"> of {{ study.name }}</span>
                  </a>
                  <a mat-stroked-button [routerLink]="['/field-planning', study.id, 'progress']">
                    Progress<span class="fc-visually-hidden"> of {{ study.name }}</span>
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
    .planning-studies {
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
    .planning-studies__actions {
      flex-wrap: wrap;
      gap: 8px;
    }
    .planning-studies__actions a {
      min-height: 48px;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PlanningStudiesPage {
  protected readonly loaded = toSignal(
    inject(FieldPlanningApi)
      .studies()
      .pipe(
        map((studies): Loaded => ({ studies, problem: null })),
        catchError((error: unknown) =>
          of<Loaded>({ studies: [], problem: readApiProblem(error).message }),
        ),
      ),
  );
  protected readonly studies = computed(() =>
    (this.loaded()?.studies ?? []).filter((study) =>
      study.myRoles.some((role) => role === 'supervisor' || role === 'researcher'),
    ),
  );
}
