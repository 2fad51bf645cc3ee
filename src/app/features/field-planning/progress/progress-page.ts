import { DOCUMENT } from '@angular/common';
import { ChangeDetectionStrategy, Component, DestroyRef, inject, signal } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { MatButton } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatProgressBar } from '@angular/material/progress-bar';
import { Subject, catchError, exhaustMap, merge, of } from 'rxjs';
import type { StudyProgress } from '@shared/routes/route-progress';
import { readApiProblem } from '../../../core/api-problem';
import { FieldPlanningApi } from '../field-planning-api';
import { PlanningStudy } from '../planning-study';
import { ProgressChart } from './progress-chart';
import { ProgressTable } from './progress-table';
import { visibleTicks } from './visible-ticks';

/** How often the page asks again while it is on screen, so counts follow the syncs. */
export const progressRefreshMs = 15_000;

/** Interviews against quota per route and per stop, refreshed while the page is visible. */
@Component({
  selector: 'app-progress-page',
  imports: [MatButton, MatCardModule, MatProgressBar, ProgressChart, ProgressTable],
  templateUrl: './progress-page.html',
  styleUrl: './progress-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ProgressPage {
  private readonly api = inject(FieldPlanningApi);
  private readonly planning = inject(PlanningStudy);
  private readonly refreshNow = new Subject<void>();

  protected readonly progress = signal<StudyProgress | null>(null);
  protected readonly failure = signal<string | null>(null);
  protected readonly refreshing = signal(false);

  constructor() {
    const studyId = this.planning.studyId();
    merge(visibleTicks(inject(DOCUMENT), progressRefreshMs), this.refreshNow)
      .pipe(
        exhaustMap(() => {
          this.refreshing.set(true);
          return this.api.progress(studyId).pipe(
            catchError((error: unknown) => {
              this.failure.set(readApiProblem(error).message);
              return of(null);
            }),
          );
        }),
        takeUntilDestroyed(inject(DestroyRef)),
      )
      .subscribe((progress) => {
        this.refreshing.set(false);
        if (!progress) return;
        this.failure.set(null);
        this.progress.set(progress);
      });
  }

  protected refresh(): void {
    this.refreshNow.next();
  }

  protected timeOf(iso: string): string {
    return new Date(iso).toLocaleTimeString(undefined, {
      hour: '2-digit',
      minute: '2-digit',
      second: '2-digit',
    });
  }
}
