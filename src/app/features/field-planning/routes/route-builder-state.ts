import { moveItemInArray } from '@angular/cdk/drag-drop';
import { Injectable, computed, signal } from '@angular/core';
import type { FieldIssue } from '@shared/http/api-error';
import type { FieldRoute } from '@shared/routes/field-route';
import { fieldRouteInputSchema, type FieldRouteInput } from '@shared/routes/field-route-input';
import type { SamplingPoint } from '@shared/sampling/sampling-point';

/** One planned stop: the point and its interview quota (NaN while the field is empty). */
export interface PlannedStop {
  readonly point: SamplingPoint;
  readonly quota: number;
}

type PointLike = Pick<SamplingPoint, 'id' | 'code' | 'name' | 'stratum'>;

/**
 * The route a supervisor is building: name, date window, enumerator and ordered stops with
 * quotas. It checks itself with the same shared schema the server uses, and keeps the server's
 * own answer (e.g. a point that left the study) beside the field it names until the next change.
 */
@Injectable()
export class RouteBuilderState {
  private readonly points = signal<readonly SamplingPoint[]>([]);
  private readonly plan = signal({
    name: '',
    windowStart: '',
    windowEnd: '',
    enumeratorId: null as string | null,
  });
  private readonly stopList = signal<readonly PlannedStop[]>([]);
  private readonly fromServer = signal<readonly FieldIssue[]>([]);

  readonly stops = this.stopList.asReadonly();
  readonly name = computed(() => this.plan().name);
  readonly windowStart = computed(() => this.plan().windowStart);
  readonly windowEnd = computed(() => this.plan().windowEnd);
  readonly enumeratorId = computed(() => this.plan().enumeratorId);
  readonly search = signal('');
  /** Set by the first save attempt: problems show from then on, not while typing the first time. */
  readonly showProblems = signal(false);

  readonly totalQuota = computed(() =>
    this.stopList().reduce((sum, stop) => sum + (Number.isFinite(stop.quota) ? stop.quota : 0), 0),
  );

  /** Points not on the route yet, narrowed by the search text (code, name or stratum). */
  readonly availablePoints = computed(() => {
    const chosen = new Set(this.stopList().map((stop) => stop.point.id));
    const words = this.search().trim().toLowerCase().split(/\s+/).filter(Boolean);
    return this.points().filter(
      (point) => !chosen.has(point.id) && words.every((word) => matches(point, word)),
    );
  });

  readonly input = computed<FieldRouteInput>(() => {
    const { name, windowStart, windowEnd, enumeratorId } = this.plan();
    const stops = this.stopList().map((stop) => ({ pointId: stop.point.id, quota: stop.quota }));
    return { name, windowStart, windowEnd, enumeratorId, stops };
  });

  /** Every problem of the route as it stands, by field path (`stops.1.quota`, `windowEnd`…). */
  readonly problems = computed<readonly FieldIssue[]>(() => {
    const parsed = fieldRouteInputSchema.safeParse(this.input());
    const own = parsed.success
      ? []
      : parsed.error.issues.map((issue) => ({
          path: issue.path.join('.'),
          message: issue.message,
        }));
    return [...own, ...this.fromServer()];
  });

  readonly valid = computed(() => this.problems().length === 0);

  setPoints(points: readonly SamplingPoint[]): void {
    this.points.set(points);
  }

  /** Starts from a stored route, for editing it. */
  load(route: FieldRoute): void {
    const byId = new Map(this.points().map((point) => [point.id, point]));
    this.plan.set({
      name: route.name,
      windowStart: route.windowStart,
      windowEnd: route.windowEnd,
      enumeratorId: route.enumerator?.userId ?? null,
    });
    this.stopList.set(
      route.stops.map((stop) => ({
        point: byId.get(stop.pointId) ?? pointOfStop(stop),
        quota: stop.quota,
      })),
    );
  }

  setName(name: string): void {
    this.change(() => this.plan.update((plan) => ({ ...plan, name })));
  }

  setWindow(windowStart: string, windowEnd: string): void {
    this.change(() => this.plan.update((plan) => ({ ...plan, windowStart, windowEnd })));
  }

  setEnumerator(enumeratorId: string | null): void {
    this.change(() => this.plan.update((plan) => ({ ...plan, enumeratorId })));
  }

  addPoint(pointId: string, quota = 1): void {
    const point = this.points().find((p) => p.id === pointId);
    if (!point || this.stopList().some((stop) => stop.point.id === pointId)) return;
    this.change(() => this.stopList.update((stops) => [...stops, { point, quota }]));
  }

  removeStop(index: number): void {
    this.change(() => this.stopList.update((stops) => stops.filter((_, i) => i !== index)));
  }

  moveStop(from: number, to: number): void {
    this.change(() =>
      this.stopList.update((stops) => {
        const copy = [...stops];
        moveItemInArray(copy, from, Math.max(0, Math.min(to, copy.length - 1)));
        return copy;
      }),
    );
  }

  setQuota(index: number, quota: number): void {
    this.change(() =>
      this.stopList.update((stops) => stops.map((s, i) => (i === index ? { ...s, quota } : s))),
    );
  }

  /** The server refused the route: keep its reasons beside their fields until the next change. */
  refusedWith(issues: readonly FieldIssue[]): void {
    this.fromServer.set(issues);
    this.showProblems.set(true);
  }

  problemAt(path: string): string | null {
    if (!this.showProblems()) return null;
    return this.problems().find((issue) => issue.path === path)?.message ?? null;
  }

  private change(apply: () => void): void {
    apply();
    this.fromServer.set([]);
  }
}

function matches(point: PointLike, word: string): boolean {
  return [point.code, point.name, point.stratum].some((text) => text.toLowerCase().includes(word));
}

function pointOfStop(stop: FieldRoute['stops'][number]): SamplingPoint {
  const { pointId, code, name, kind, stratum, latitude, longitude } = stop;
  return { id: pointId, code, name, kind, stratum, latitude, longitude, notes: '', updatedAt: '' };
}
