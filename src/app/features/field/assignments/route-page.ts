import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatButton } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatIcon } from '@angular/material/icon';
import { Router, RouterLink } from '@angular/router';
import { samplingPointKindLabels } from '@shared/sampling/sampling-point-kind';
import type { RouteStop } from '@shared/routes/field-route';
import type { FieldQuestionnaireVersion } from '@shared/field-sync/field-assignments';
import { InterviewDrafts } from '../interview/interview-drafts';
import { AssignmentsCache } from './assignments-cache';
import { routeOf, runnableVersions } from './assignment-lookup';
import { PointProgress, noCounts, type PointCounts } from './point-progress';

/** One route: its stops in visiting order, the quota and progress at each, and where to start. */
@Component({
  selector: 'app-route-page',
  imports: [DatePipe, MatButton, MatCardModule, MatIcon, RouterLink],
  templateUrl: './route-page.html',
  styleUrls: ['../field-page.scss', './route-page.scss'],
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RoutePage {
  private readonly drafts = inject(InterviewDrafts);
  private readonly router = inject(Router);
  private readonly cached = toSignal(inject(AssignmentsCache).watch(), { initialValue: undefined });
  private readonly progress = toSignal(inject(PointProgress).watch(), {
    initialValue: new Map<string, PointCounts>(),
  });

  readonly routeId = input.required<string>();
  protected readonly kindLabels = samplingPointKindLabels;
  protected readonly starting = signal<string | null>(null);
  protected readonly startProblem = signal<string | null>(null);

  protected readonly loading = computed(() => this.cached() === undefined);
  protected readonly found = computed(() => {
    const payload = this.cached()?.payload;
    return payload ? routeOf(payload, this.routeId()) : null;
  });
  protected readonly versions = computed(() => {
    const payload = this.cached()?.payload;
    const found = this.found();
    return payload && found ? runnableVersions(payload, found.route.studyId) : [];
  });
  protected readonly stops = computed(() =>
    (this.found()?.route.stops ?? []).map((stop) => ({
      stop,
      counts: this.progress().get(stop.pointId) ?? noCounts,
    })),
  );

  protected async startInterview(
    stop: RouteStop,
    version: FieldQuestionnaireVersion,
  ): Promise<void> {
    const found = this.found();
    if (!found || this.starting()) return;
    this.starting.set(stop.pointId);
    try {
      const draft = await this.drafts.start({
        studyId: found.route.studyId,
        routeId: found.route.id,
        pointId: stop.pointId,
        questionnaireVersionId: version.id,
      });
      await this.router.navigate(['/field/interviews', draft.id]);
    } catch (error) {
      this.startProblem.set(error instanceof Error ? error.message : String(error));
    } finally {
      this.starting.set(null);
    }
  }
}
