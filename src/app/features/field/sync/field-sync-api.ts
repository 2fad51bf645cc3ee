import { HttpClient, HttpHeaders } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import {
  fieldAssignmentsSchema,
  type FieldAssignments,
} from '@shared/field-sync/field-assignments';
import type { FieldInterview } from '@shared/field-sync/field-interview';
import { fieldNoticesSchema, type FieldNotice } from '@shared/field-sync/field-notice';
import { receivedBytesHeader, type PhotoUploadState } from '@shared/field-sync/photo-manifest';
import type { SyncBatchResult } from '@shared/field-sync/sync-batch';
import { withoutErrorNotice } from '../../../core/error-notice-context';

/**
 * The field endpoints of the server. Errors are not announced by the shell's snack bar: the
 * sync page shows them, and a device without network would otherwise be told so every minute.
 */
@Injectable({ providedIn: 'root' })
export class FieldSyncApi {
  private readonly http = inject(HttpClient);
  private readonly quiet = { context: withoutErrorNotice() };

  async assignments(): Promise<FieldAssignments> {
    const body = await firstValueFrom(this.http.get('/api/field/assignments', this.quiet));
    return fieldAssignmentsSchema.parse(body);
  }

  /** Sends a batch, saying how many interviews still wait behind it (supervisors see that). */
  sendBatch(interviews: readonly FieldInterview[], outboxCount?: number): Promise<SyncBatchResult> {
    return firstValueFrom(
      this.http.post<SyncBatchResult>('/api/field/sync', { interviews, outboxCount }, this.quiet),
    );
  }

  /** How many bytes of the photo the server holds: where the next chunk starts. */
  async photoOffset(photoId: string): Promise<number> {
    const response = await firstValueFrom(
      this.http.head(photoPath(photoId), { ...this.quiet, observe: 'response' }),
    );
    return Number(response.headers.get(receivedBytesHeader) ?? 0);
  }

  /** Sends the bytes from `offset` on; the server answers where the upload now stands. */
  putChunk(photoId: string, offset: number, chunk: Blob): Promise<PhotoUploadState> {
    return firstValueFrom(
      this.http.put<PhotoUploadState>(`${photoPath(photoId)}?offset=${offset}`, chunk, {
        ...this.quiet,
        headers: new HttpHeaders({ 'Content-Type': 'application/octet-stream' }),
      }),
    );
  }

  photoState(photoId: string): Promise<PhotoUploadState> {
    return firstValueFrom(this.http.get<PhotoUploadState>(photoPath(photoId), this.quiet));
  }

  async notices(): Promise<FieldNotice[]> {
    const body = await firstValueFrom(this.http.get('/api/field/notices', this.quiet));
    return fieldNoticesSchema.parse(body).notices;
  }
}

function photoPath(photoId: string): string {
  return `/api/field/photos/${encodeURIComponent(photoId)}`;
}
