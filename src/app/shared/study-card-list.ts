import { NgTemplateOutlet } from '@angular/common';
import {
  ChangeDetectionStrategy,
  Component,
  TemplateRef,
  computed,
  contentChild,
  input,
} from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatCardModule } from '@angular/material/card';
import { type Observable, catchError, map, of } from 'rxjs';
import type { Role } from '@shared/auth/roles';
import type { Study } from '@shared/studies/study';
import { readApiProblem } from '../core/api-problem';

/** Studies as a page loaded them, or the reason they could not be loaded. */
export type LoadedStudies = { studies: Study[]; problem: null } | { studies: []; problem: string };

/** Loads a study list into a signal that also carries a readable problem when the call fails. */
export function loadStudies(studies: Observable<Study[]>) {
  return toSignal(
    studies.pipe(
      map((list): LoadedStudies => ({ studies: list, problem: null })),
      catchError((error: unknown) =>
        of<LoadedStudies>({ studies: [], problem: readApiProblem(error).message }),
      ),
    ),
  );
}

/**
 * The cards of a study list page: one card per study in which the person holds one of `roles`,
 * with the page's own actions projected as an `<ng-template let-study>`.
 */
@Component({
  selector: 'app-study-card-list',
  imports: [MatCardModule, NgTemplateOutlet],
  template: `
    @if (loaded(); as result) {
      @if (result.problem) {
        <p role="alert">{{ result.problem }}</p>
      } @else if (studies().length === 0) {
        <p>{{ emptyText() }}</p>
      }
      <ul class="study-cards">
        @for (study of studies(); track study.id) {
          <li>
            <mat-card appearance="outlined">
              <mat-card-header>
                <h2 matCardTitle>{{ study.name }}</h2>
                <p matCardSubtitle>{{ study.productName }} · {{ study.market }}</p>
              </mat-card-header>
              <mat-card-actions class="study-cards__actions">
                <ng-container
                  [ngTemplateOutlet]="actions() ?? null"
                  [ngTemplateOutletContext]="{ $implicit: study }"
                />
              </mat-card-actions>
            </mat-card>
          </li>
        }
      </ul>
    }
  `,
  styles: `
    .study-cards {
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
    .study-cards__actions {
      flex-wrap: wrap;
      gap: 8px;
    }
    .study-cards__actions ::ng-deep a {
      min-height: 48px;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StudyCardList {
  readonly loaded = input.required<LoadedStudies | undefined>();
  readonly roles = input.required<readonly Role[]>();
  readonly emptyText = input.required<string>();
  protected readonly actions = contentChild(TemplateRef<{ $implicit: Study }>);
  protected readonly studies = computed(() =>
    (this.loaded()?.studies ?? []).filter((study) =>
      study.myRoles.some((role) => this.roles().includes(role)),
    ),
  );
}
