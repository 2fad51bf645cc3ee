import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable } from 'rxjs';
import type { Study, StudyCreate, StudyUpdate } from '@shared/studies/study';
import type { StudyMember, StudyMemberCandidate, StudyRole } from '@shared/studies/study-member';
import type { StudyStatus } from '@shared/studies/study-status';
import { withoutErrorNotice } from '../../core/error-notice-context';

/** The study endpoints. Callers show failures in place, so the global notice stays quiet. */
@Injectable({ providedIn: 'root' })
export class StudiesApi {
  private readonly http = inject(HttpClient);
  private readonly quiet = { context: withoutErrorNotice() };

  list(): Observable<Study[]> {
    return this.http.get<Study[]>('/api/studies', this.quiet);
  }

  get(studyId: string): Observable<Study> {
    return this.http.get<Study>(studyPath(studyId), this.quiet);
  }

  create(study: StudyCreate): Observable<Study> {
    return this.http.post<Study>('/api/studies', study, this.quiet);
  }

  update(studyId: string, update: StudyUpdate): Observable<Study> {
    return this.http.patch<Study>(studyPath(studyId), update, this.quiet);
  }

  changeStatus(studyId: string, status: StudyStatus): Observable<Study> {
    return this.http.post<Study>(`${studyPath(studyId)}/status`, { status }, this.quiet);
  }

  members(studyId: string): Observable<StudyMember[]> {
    return this.http.get<StudyMember[]>(`${studyPath(studyId)}/members`, this.quiet);
  }

  candidates(studyId: string): Observable<StudyMemberCandidate[]> {
    return this.http.get<StudyMemberCandidate[]>(
      `${studyPath(studyId)}/member-candidates`,
      this.quiet,
    );
  }

  setMember(studyId: string, userId: string, roles: StudyRole[]): Observable<StudyMember> {
    const path = `${studyPath(studyId)}/members/${encodeURIComponent(userId)}`;
    return this.http.put<StudyMember>(path, { roles }, this.quiet);
  }

  removeMember(studyId: string, userId: string): Observable<unknown> {
    const path = `${studyPath(studyId)}/members/${encodeURIComponent(userId)}`;
    return this.http.delete(path, this.quiet);
  }
}

export const studyPath = (studyId: string) => `/api/studies/${encodeURIComponent(studyId)}`;
