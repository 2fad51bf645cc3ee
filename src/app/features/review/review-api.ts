import { HttpClient, HttpParams } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import type { Observable } from 'rxjs';
import type { InterviewDetail } from '@shared/field-sync/interview-detail';
import type { ReviewActionBody } from '@shared/field-sync/review-action';
import type {
  BulkAcceptResult,
  PendingReviewCount,
  ReviewFacets,
  ReviewQueue,
} from '@shared/field-sync/review-queue';
import type { Study } from '@shared/studies/study';
import { withoutErrorNotice } from '../../core/error-notice-context';
import { filterToParams, queuePageSize, type QueueFilter } from './queue-filter';

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

  queue(
    studyId: string,
    filter: QueueFilter,
    offset = 0,
    limit = queuePageSize,
  ): Observable<ReviewQueue> {
    const params = new HttpParams({ fromObject: filterToParams(filter) })
      .set('limit', limit)
      .set('offset', offset);
    return this.http.get<ReviewQueue>(`/api/studies/${studyId}/review`, {
      params,
      context: withoutErrorNotice(),
    });
  }

  facets(studyId: string): Observable<ReviewFacets> {
    return this.http.get<ReviewFacets>(`/api/studies/${studyId}/review/facets`, {
      context: withoutErrorNotice(),
    });
  }

  pending(): Observable<PendingReviewCount[]> {
    return this.http.get<PendingReviewCount[]>('/api/review/pending', {
      context: withoutErrorNotice(),
    });
  }

  acceptSeveral(studyId: string, interviewIds: string[]): Observable<BulkAcceptResult> {
    return this.http.post<BulkAcceptResult>(
      `/api/studies/${studyId}/review/accept`,
      { interviewIds },
      { context: withoutErrorNotice() },
    );
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
