import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable } from 'rxjs';
import type { ApiToken, IssuedApiToken, IssueApiTokenRequest } from '@shared/analysis/api-token';
import type { Study } from '@shared/studies/study';
import type { ScheduleVersion, ScheduleVersionSummary } from '@shared/analysis/schedule-version';
import { withoutErrorNotice } from '../../core/error-notice-context';

const versionPath = (studyId: string, versionId: string) =>
  `/api/studies/${encodeURIComponent(studyId)}/schedules/${encodeURIComponent(versionId)}`;

/** The three formats a published schedule downloads in. */
export type DownloadFormat = 'csv' | 'xlsx' | 'pdf';

/** Where a version downloads in a format; the browser sends the session cookie with it. */
export function downloadUrl(studyId: string, versionId: string, format: DownloadFormat): string {
  return `${versionPath(studyId, versionId)}/download.${format}`;
}

/**
 * The client's portal endpoints: published schedules of their studies (nothing else reaches a
 * client) and their access tokens for the read API. Pages show failures in place.
 */
@Injectable({ providedIn: 'root' })
export class PortalApi {
  private readonly http = inject(HttpClient);
  private readonly quiet = { context: withoutErrorNotice() };

  listSchedules(): Observable<ScheduleVersionSummary[]> {
    return this.http.get<ScheduleVersionSummary[]>('/api/portal/schedules', this.quiet);
  }

  listStudyVersions(studyId: string): Observable<ScheduleVersionSummary[]> {
    return this.http.get<ScheduleVersionSummary[]>(
      `/api/studies/${encodeURIComponent(studyId)}/schedules`,
      this.quiet,
    );
  }

  getVersion(studyId: string, versionId: string): Observable<ScheduleVersion> {
    return this.http.get<ScheduleVersion>(versionPath(studyId, versionId), this.quiet);
  }

  listTokens(): Observable<ApiToken[]> {
    return this.http.get<ApiToken[]>('/api/portal/tokens', this.quiet);
  }

  issueToken(request: IssueApiTokenRequest): Observable<IssuedApiToken> {
    return this.http.post<IssuedApiToken>('/api/portal/tokens', request, this.quiet);
  }

  /** The studies shared with the client, to restrict a token to some of them. */
  listStudies(): Observable<Study[]> {
    return this.http.get<Study[]>('/api/studies', this.quiet);
  }

  revokeToken(tokenId: string): Observable<unknown> {
    return this.http.delete(`/api/portal/tokens/${encodeURIComponent(tokenId)}`, this.quiet);
  }
}
