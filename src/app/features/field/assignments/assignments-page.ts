import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatButton } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatIcon } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import type { FieldRoute } from '@shared/routes/field-route';
import { describeSyncFailure } from '../sync/sync-failure';
import { AssignmentsCache } from './assignments-cache';
import { studyOf } from './assignment-lookup';
import { PointProgress, noCounts, type PointCounts } from './point-progress';

/** "My routes": the enumerator's routes as kept on the device, with progress at each. */
@Component({
  selector: 'app-assignments-page',
  imports: [DatePipe, MatButton, MatCardModule, MatIcon, RouterLink],
  templateUrl: './assignments-page.html',
  styleUrls: ['../field-page.scss', './assignments-page.scss'],
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AssignmentsPage {
  private readonly cache = inject(AssignmentsCache);
  private readonly cached = toSignal(this.cache.watch(), { initialValue: undefined });
  private readonly progress = toSignal(inject(PointProgress).watch(), {
    initialValue: new Map<string, PointCounts>(),
  });

  protected readonly loading = computed(() => this.cached() === undefined);
  protected readonly assignments = computed(() => this.cached()?.payload ?? null);
  protected readonly fetchedAt = computed(() => this.cached()?.fetchedAt ?? null);
  protected readonly refreshProblem = signal<string | null>(null);
  protected readonly refreshing = signal(false);

  protected readonly routes = computed(() => {
    const assignments = this.assignments();
    if (!assignments) return [];
    return assignments.routes.map((route) => ({
      route,
      study: studyOf(assignments, route.studyId),
      ...this.totals(route),
    }));
  });

  protected readonly inProgress = computed(() => {
    const assignments = this.assignments();
    const drafts = [...this.progress().values()].flatMap((counts) => counts.inProgress);
    return drafts.map((draft) => {
      const route = assignments?.routes.find((r) => r.id === draft.routeId);
      const stop = route?.stops.find((s) => s.pointId === draft.pointId);
      return { draft, pointName: stop?.name ?? 'a point no longer assigned' };
    });
  });

  constructor() {
    void this.refresh();
  }

  /** Fetches the latest assignments when online; the device's copy stays when not. */
  protected async refresh(): Promise<void> {
    if (globalThis.navigator?.onLine === false) return;
    this.refreshing.set(true);
    try {
      await this.cache.refresh();
      this.refreshProblem.set(null);
    } catch (error) {
      this.refreshProblem.set(describeSyncFailure(error));
    } finally {
      this.refreshing.set(false);
    }
  }

  private totals(route: FieldRoute): { quota: number; done: number } {
    const progress = this.progress();
    return route.stops.reduce(
      (sum, stop) => ({
        quota: sum.quota + stop.quota,
        done: sum.done + (progress.get(stop.pointId) ?? noCounts).done,
      }),
      { quota: 0, done: 0 },
    );
  }
}
