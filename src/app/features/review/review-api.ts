import { HttpClient, HttpParams } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import type { Observable } from 'rxjs';
import type { InterviewDetail } from '@shared/field-sync/interview-detail';
import type { ReviewActionBody } from '@shared/field-sync/review-action';
import type { ReviewQueue } from '@shared/field-sync/review-queue';
import type { InterviewStatus } from '@shared/interviews/interview-status';
import type { Study } from '@shared/studies/study';
import { withoutErrorNotice } from '../../core/error-notice-context';

/** The supervisor's review endpoints of a study. */
@Injectable({ providedIn: 'root' })
export class ReviewApi {
  private readonly http = inject(HttpClient);

  studies(): Observable<Study[]> {
    return this.http.get<Study[]>('/api/studies', { context: withoutErrorNotice() });
  }

  study(studyId: string): Observable<Study> {
    return this.http.get<Study>(`/api/studies/${studyId}`, { context: withoutErrorNotice() });
  }

  queue(studyId: string, status: InterviewStatus | null, offset = 0): Observable<ReviewQueue> {
    let params = new HttpParams().set('limit', 50).set('offset', offset);
    if (status) params = params.set('status', status);
    return this.http.get<ReviewQueue>(`/api/studies/${studyId}/review`, {
      params,
      context: withoutErrorNotice(),
    });
  }

  interview(studyId: string, interviewId: string): Observable<InterviewDetail> {
    return this.http.get<InterviewDetail>(`/api/studies/${studyId}/interviews/${interviewId}`, {
      context: withoutErrorNotice(),
    });
  }

  review(
    studyId: string,
    interviewId: string,
    body: ReviewActionBody,
  ): Observable<InterviewDetail> {
    return this.http.post<InterviewDetail>(
      `/api/studies/${studyId}/interviews/${interviewId}/review`,
      body,
      { context: withoutErrorNotice() },
    );
  }
}
