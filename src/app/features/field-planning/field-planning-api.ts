import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable } from 'rxjs';
import type { FieldRoute, StudyEnumerator } from '@shared/routes/field-route';
import type { FieldRouteInput } from '@shared/routes/field-route-input';
import type { StudyProgress } from '@shared/routes/route-progress';
import type { SamplingImportResult, SamplingPoint } from '@shared/sampling/sampling-point';
import type { Study } from '@shared/studies/study';
import { withoutErrorNotice } from '../../core/error-notice-context';

const studyPath = (studyId: string) => `/api/studies/${encodeURIComponent(studyId)}`;

/**
 * Sampling points, routes and progress of one study. Pages show failures in place (a CSV's
 * problems, a field's message), so the global notice stays quiet for these requests.
 */
@Injectable({ providedIn: 'root' })
export class FieldPlanningApi {
  private readonly http = inject(HttpClient);
  private readonly quiet = { context: withoutErrorNotice() };

  studies(): Observable<Study[]> {
    return this.http.get<Study[]>('/api/studies', this.quiet);
  }

  study(studyId: string): Observable<Study> {
    return this.http.get<Study>(studyPath(studyId), this.quiet);
  }

  points(studyId: string): Observable<SamplingPoint[]> {
    return this.http.get<SamplingPoint[]>(`${studyPath(studyId)}/sampling-points`, this.quiet);
  }

  /** Sends the file as it is; the server reads and checks every row. */
  importPoints(studyId: string, csv: string): Observable<SamplingImportResult> {
    return this.http.post<SamplingImportResult>(
      `${studyPath(studyId)}/sampling-points/import`,
      csv,
      { ...this.quiet, headers: { 'Content-Type': 'text/csv' } },
    );
  }

  routes(studyId: string): Observable<FieldRoute[]> {
    return this.http.get<FieldRoute[]>(`${studyPath(studyId)}/routes`, this.quiet);
  }

  route(studyId: string, routeId: string): Observable<FieldRoute> {
    return this.http.get<FieldRoute>(routePath(studyId, routeId), this.quiet);
  }

  createRoute(studyId: string, input: FieldRouteInput): Observable<FieldRoute> {
    return this.http.post<FieldRoute>(`${studyPath(studyId)}/routes`, input, this.quiet);
  }

  updateRoute(studyId: string, routeId: string, input: FieldRouteInput): Observable<FieldRoute> {
    return this.http.put<FieldRoute>(routePath(studyId, routeId), input, this.quiet);
  }

  deleteRoute(studyId: string, routeId: string): Observable<unknown> {
    return this.http.delete(routePath(studyId, routeId), this.quiet);
  }

  assign(studyId: string, routeId: string, enumeratorId: string | null): Observable<FieldRoute> {
    const path = `${routePath(studyId, routeId)}/assignment`;
    return this.http.put<FieldRoute>(path, { enumeratorId }, this.quiet);
  }

  enumerators(studyId: string): Observable<StudyEnumerator[]> {
    return this.http.get<StudyEnumerator[]>(`${studyPath(studyId)}/enumerators`, this.quiet);
  }

  progress(studyId: string): Observable<StudyProgress> {
    return this.http.get<StudyProgress>(`${studyPath(studyId)}/progress`, this.quiet);
  }
}

const routePath = (studyId: string, routeId: string) =>
  `${studyPath(studyId)}/routes/${encodeURIComponent(routeId)}`;
