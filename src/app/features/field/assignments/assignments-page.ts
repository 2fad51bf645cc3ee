import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { takeUntilDestroyed, toSignal } from '@angular/core/rxjs-interop';
import { MatButton } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatIcon } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import { fromEvent } from 'rxjs';
import type { FieldRoute } from '@shared/routes/field-route';
import { describeSyncFailure } from '../sync/sync-failure';
import { AssignmentsCache } from './assignments-cache';
import { studyOf } from './assignment-lookup';
import { PointProgress, noCounts, type PointCounts } from './point-progress';
import { localDay, routeWindowState } from './route-window';

/**
 * "My routes": the enumerator's routes as kept on the device, with what this device recorded on
 * each (the device has no other devices' interviews, so it never claims the route's total) and
 * whether the route's dates are over. Updates when asked and whenever the connection comes back.
 */
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
  protected readonly offline = signal(globalThis.navigator?.onLine === false);
  private readonly today = signal(localDay(new Date()));

  protected readonly routes = computed(() => {
    const assignments = this.assignments();
    if (!assignments) return [];
    return assignments.routes.map((route) => ({
      route,
      study: studyOf(assignments, route.studyId),
      window: routeWindowState(route, this.today()),
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
    fromEvent(window, 'offline')
      .pipe(takeUntilDestroyed())
      .subscribe(() => this.offline.set(true));
    fromEvent(window, 'online')
      .pipe(takeUntilDestroyed())
      .subscribe(() => void this.refresh());
    void this.refresh();
  }

  /** Fetches the latest assignments when online; the device's copy stays when not. */
  protected async refresh(): Promise<void> {
    this.today.set(localDay(new Date()));
    this.offline.set(globalThis.navigator?.onLine === false);
    if (this.offline()) return;
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
