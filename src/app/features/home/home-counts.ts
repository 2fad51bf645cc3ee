import { HttpClient } from '@angular/common/http';
import { Injectable, Injector, inject, signal } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import type { Role } from '@shared/auth/roles';
import type { PendingReviewCount } from '@shared/field-sync/review-queue';
import { withoutErrorNotice } from '../../core/error-notice-context';
import type { HomeCountKind } from './role-welcome';

type Counts = Partial<Record<HomeCountKind, number>>;

/**
 * The figures of the home cards, each from a list the app fetches anyway (the studies list, the
 * client's reports, the routes kept on the device). A figure that cannot be had — offline, say —
 * is left out rather than shown as a failure: the home page still works without it.
 */
@Injectable()
export class HomeCounts {
  private readonly http = inject(HttpClient);
  private readonly injector = inject(Injector);
  private readonly counts = signal<Counts>({});

  readonly values = this.counts.asReadonly();

  load(roles: readonly Role[]): void {
    const has = (...wanted: Role[]) => wanted.some((role) => roles.includes(role));
    if (has('researcher', 'supervisor')) this.count('studies', this.listLength('/api/studies'));
    if (has('supervisor')) this.count('pendingReviews', this.pendingReviews());
    if (has('client')) this.count('schedules', this.listLength('/api/portal/schedules'));
    if (has('enumerator')) this.count('routesOnDevice', this.routesOnDevice());
  }

  private count(kind: HomeCountKind, value: Promise<number>): void {
    value.then(
      (count) => this.counts.update((counts) => ({ ...counts, [kind]: count })),
      () => undefined,
    );
  }

  private async listLength(path: string): Promise<number> {
    const list = await firstValueFrom(
      this.http.get<unknown[]>(path, { context: withoutErrorNotice() }),
    );
    return list.length;
  }

  /** Interviews waiting for a decision in every study the person supervises. */
  private async pendingReviews(): Promise<number> {
    const counts = await firstValueFrom(
      this.http.get<PendingReviewCount[]>('/api/review/pending', { context: withoutErrorNotice() }),
    );
    return counts.reduce((sum, count) => sum + count.pending, 0);
  }

  /** Read from the device's store; the store's code is loaded only for enumerators. */
  private async routesOnDevice(): Promise<number> {
    const { AssignmentsCache } = await import('../field/assignments/assignments-cache');
    const cached = await this.injector.get(AssignmentsCache).read();
    if (!cached) return 0;
    return cached.payload.routes.length;
  }
}
