import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatButton } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatIcon } from '@angular/material/icon';
import { MatProgressBar } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import { portalSchedulePath } from '@shared/analysis/portal-paths';
import type { ScheduleVersionSummary } from '@shared/analysis/schedule-version';
import { catchError, map, of } from 'rxjs';
import { readApiProblem } from '../../core/api-problem';
import { PortalApi } from './portal-api';
import { groupByStudy, type StudySchedules } from './schedule-groups';

type ListState =
  | { readonly status: 'loading' }
  | { readonly status: 'loaded'; readonly studies: readonly StudySchedules[] }
  | { readonly status: 'failed'; readonly message: string };

/** The client's published demand schedules, by study, with the way to API access. */
@Component({
  selector: 'app-reports-page',
  imports: [DatePipe, MatButton, MatCardModule, MatIcon, MatProgressBar, RouterLink],
  templateUrl: './reports-page.html',
  styleUrl: './reports-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReportsPage {
  protected readonly state = toSignal(
    inject(PortalApi)
      .listSchedules()
      .pipe(
        map((versions): ListState => ({ status: 'loaded', studies: groupByStudy(versions) })),
        catchError((error: unknown) =>
          of<ListState>({ status: 'failed', message: readApiProblem(error).message }),
        ),
      ),
    { initialValue: { status: 'loading' } as ListState },
  );
  protected readonly studies = computed(() => {
    const state = this.state();
    return state.status === 'loaded' ? state.studies : [];
  });
  protected readonly problem = computed(() => {
    const state = this.state();
    return state.status === 'failed' ? state.message : null;
  });

  protected pathOf(version: ScheduleVersionSummary): string {
    return portalSchedulePath(version.studyId, version.id);
  }
}
