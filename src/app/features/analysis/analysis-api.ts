import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable, forkJoin, map, of, switchMap } from 'rxjs';
import type { FitResource, FitSummary } from '@shared/analysis/fit-resource';
import type { FitSpec } from '@shared/analysis/fit-spec';
import type {
  PublishScheduleRequest,
  ScheduleVersion,
  ScheduleVersionSummary,
} from '@shared/analysis/schedule-version';
import type {
  Questionnaire,
  QuestionnaireVersion,
} from '@shared/questionnaire/questionnaire-resource';
import type { FieldRoute } from '@shared/routes/field-route';
import type { SamplingPoint } from '@shared/sampling/sampling-point';
import type { Study } from '@shared/studies/study';
import { withoutErrorNotice } from '../../core/error-notice-context';

const studyPath = (studyId: string) => `/api/studies/${encodeURIComponent(studyId)}`;

/**
 * The researcher's analysis endpoints. Each screen shows failures where they happen (beside the
 * run button, in the publish form), so the global snack bar stays quiet for these requests.
 */
@Injectable({ providedIn: 'root' })
export class AnalysisApi {
  private readonly http = inject(HttpClient);
  private readonly quiet = { context: withoutErrorNotice() };

  listStudies(): Observable<Study[]> {
    return this.http.get<Study[]>('/api/studies', this.quiet);
  }

  getStudy(studyId: string): Observable<Study> {
    return this.http.get<Study>(studyPath(studyId), this.quiet);
  }

  listRoutes(studyId: string): Observable<FieldRoute[]> {
    return this.http.get<FieldRoute[]>(`${studyPath(studyId)}/routes`, this.quiet);
  }

  /** The regions (strata) of the study's sampling points, sorted, each once. */
  listRegions(studyId: string): Observable<string[]> {
    return this.http
      .get<SamplingPoint[]>(`${studyPath(studyId)}/sampling-points`, this.quiet)
      .pipe(map((points) => [...new Set(points.map((p) => p.stratum))].sort()));
  }

  /**
   * The income bands of the study's published questionnaires (value and label), each value
   * once: the levels a researcher rakes income to.
   */
  listIncomeBands(studyId: string): Observable<{ value: string; label: string }[]> {
    const base = `${studyPath(studyId)}/questionnaires`;
    return this.http.get<Questionnaire[]>(base, this.quiet).pipe(
      switchMap((questionnaires) => {
        const latest = questionnaires.flatMap((q) => {
          const published = q.versions.find((v) => v.status === 'published');
          return published ? [`${base}/${q.id}/versions/${published.version}`] : [];
        });
        if (latest.length === 0) return of([] as QuestionnaireVersion[]);
        return forkJoin(latest.map((url) => this.http.get<QuestionnaireVersion>(url, this.quiet)));
      }),
      map((versions) => {
        const bands = new Map<string, string>();
        for (const version of versions) {
          for (const block of version.definition.blocks) {
            if (block.kind !== 'income-band') continue;
            for (const band of block.bands) bands.set(band.value, band.label);
          }
        }
        return [...bands].map(([value, label]) => ({ value, label }));
      }),
    );
  }

  startFit(studyId: string, spec: FitSpec): Observable<{ fitId: string }> {
    return this.http.post<{ fitId: string }>(`${studyPath(studyId)}/fits`, { spec }, this.quiet);
  }

  getFit(studyId: string, fitId: string): Observable<FitResource> {
    return this.http.get<FitResource>(
      `${studyPath(studyId)}/fits/${encodeURIComponent(fitId)}`,
      this.quiet,
    );
  }

  listFits(studyId: string): Observable<FitSummary[]> {
    return this.http.get<FitSummary[]>(`${studyPath(studyId)}/fits`, this.quiet);
  }

  listSchedules(studyId: string): Observable<ScheduleVersionSummary[]> {
    return this.http.get<ScheduleVersionSummary[]>(`${studyPath(studyId)}/schedules`, this.quiet);
  }

  /** Publishes a fit; the answer says how many of the study's clients were e-mailed. */
  publish(
    studyId: string,
    request: PublishScheduleRequest,
  ): Observable<ScheduleVersion & { clientsNotified?: number }> {
    return this.http.post<ScheduleVersion & { clientsNotified?: number }>(
      `${studyPath(studyId)}/schedules`,
      request,
      this.quiet,
    );
  }
}
