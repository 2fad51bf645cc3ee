import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable } from 'rxjs';
import type { FieldDevice } from '@shared/field-sync/field-device';
import type { Study } from '@shared/studies/study';
import { withoutErrorNotice } from '../../core/error-notice-context';

/** A study's field devices and signing one out; pages show failures in place. */
@Injectable({ providedIn: 'root' })
export class DevicesApi {
  private readonly http = inject(HttpClient);
  private readonly quiet = { context: withoutErrorNotice() };

  studies(): Observable<Study[]> {
    return this.http.get<Study[]>('/api/studies', this.quiet);
  }

  study(studyId: string): Observable<Study> {
    return this.http.get<Study>(`/api/studies/${encodeURIComponent(studyId)}`, this.quiet);
  }

  devices(studyId: string): Observable<FieldDevice[]> {
    return this.http.get<FieldDevice[]>(
      `/api/studies/${encodeURIComponent(studyId)}/devices`,
      this.quiet,
    );
  }

  signOut(studyId: string, deviceId: string): Observable<FieldDevice> {
    return this.http.post<FieldDevice>(
      `/api/studies/${encodeURIComponent(studyId)}/devices/${encodeURIComponent(deviceId)}/sign-out`,
      {},
      this.quiet,
    );
  }
}
