import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatIcon } from '@angular/material/icon';
import { MatProgressBar } from '@angular/material/progress-bar';
import { MatSnackBar } from '@angular/material/snack-bar';
import { RouterLink } from '@angular/router';
import { forkJoin, of } from 'rxjs';
import type { FieldRoute, StudyEnumerator } from '@shared/routes/field-route';
import { readApiProblem } from '../../../core/api-problem';
import { FieldPlanningApi } from '../field-planning-api';
import { formatDay } from '../iso-day';
import { PlanningStudy } from '../planning-study';
import { RouteAssignmentControl } from './route-assignment-control';

/** The study's routes: stops and quotas at a glance, and who each is assigned to. */
@Component({
  selector: 'app-routes-page',
  imports: [MatButton, MatCardModule, MatIcon, MatProgressBar, RouterLink, RouteAssignmentControl],
  templateUrl: './routes-page.html',
  styleUrl: './routes-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RoutesPage {
  private readonly api = inject(FieldPlanningApi);
  private readonly snackBar = inject(MatSnackBar);
  protected readonly planning = inject(PlanningStudy);
  protected readonly formatDay = formatDay;

  protected readonly routes = signal<readonly FieldRoute[]>([]);
  protected readonly enumerators = signal<readonly StudyEnumerator[]>([]);
  protected readonly loading = signal(true);
  protected readonly failure = signal<string | null>(null);

  constructor() {
    const studyId = this.planning.studyId();
    forkJoin({
      routes: this.api.routes(studyId),
      enumerators: this.planning.canEdit() ? this.api.enumerators(studyId) : of([]),
    }).subscribe({
      next: ({ routes, enumerators }) => {
        this.routes.set(routes);
        this.enumerators.set(enumerators);
        this.loading.set(false);
      },
      error: (error: unknown) => {
        this.failure.set(readApiProblem(error).message);
        this.loading.set(false);
      },
    });
  }

  protected totalQuota(route: FieldRoute): number {
    return route.stops.reduce((sum, stop) => sum + stop.quota, 0);
  }

  protected showAssignment(updated: FieldRoute): void {
    this.routes.update((list) => list.map((r) => (r.id === updated.id ? updated : r)));
    const who = updated.enumerator?.name ?? 'nobody';
    this.snackBar.open(`${updated.name} is assigned to ${who}; they have been e-mailed.`, 'Close', {
      duration: 6000,
    });
  }
}
