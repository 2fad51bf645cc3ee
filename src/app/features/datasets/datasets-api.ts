import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable } from 'rxjs';
import type { ColumnMapping } from '@shared/datasets/dataset-columns';
import type { DatasetFitResource } from '@shared/datasets/dataset-fit-resource';
import type { DatasetFitSpec } from '@shared/datasets/dataset-fit-spec';
import type { DatasetResource } from '@shared/datasets/dataset-resource';
import type { UploadPreview, UploadState } from '@shared/datasets/dataset-upload';
import { withoutErrorNotice } from '../../core/error-notice-context';

/** The dataset endpoints of one study. Callers show failures in place. */
@Injectable({ providedIn: 'root' })
export class DatasetsApi {
  private readonly http = inject(HttpClient);
  private readonly quiet = { context: withoutErrorNotice() };

  startUpload(studyId: string, fileName: string, totalBytes: number): Observable<UploadState> {
    return this.http.post<UploadState>(
      `${base(studyId)}/dataset-uploads`,
      { fileName, totalBytes },
      this.quiet,
    );
  }

  uploadState(studyId: string, uploadId: string): Observable<UploadState> {
    return this.http.get<UploadState>(`${base(studyId)}/dataset-uploads/${uploadId}`, this.quiet);
  }

  sendChunk(
    studyId: string,
    uploadId: string,
    offset: number,
    chunk: Blob,
  ): Observable<UploadState> {
    return this.http.put<UploadState>(
      `${base(studyId)}/dataset-uploads/${uploadId}?offset=${offset}`,
      chunk,
      { ...this.quiet, headers: { 'Content-Type': 'application/octet-stream' } },
    );
  }

  preview(studyId: string, uploadId: string): Observable<UploadPreview> {
    return this.http.get<UploadPreview>(
      `${base(studyId)}/dataset-uploads/${uploadId}/preview`,
      this.quiet,
    );
  }

  importDataset(
    studyId: string,
    body: { uploadId: string; name: string; columns: ColumnMapping[] },
  ): Observable<{ datasetId: string }> {
    return this.http.post<{ datasetId: string }>(`${base(studyId)}/datasets`, body, this.quiet);
  }

  list(studyId: string): Observable<DatasetResource[]> {
    return this.http.get<DatasetResource[]>(`${base(studyId)}/datasets`, this.quiet);
  }

  get(studyId: string, datasetId: string): Observable<DatasetResource> {
    return this.http.get<DatasetResource>(`${base(studyId)}/datasets/${datasetId}`, this.quiet);
  }

  remove(studyId: string, datasetId: string): Observable<void> {
    return this.http.delete<void>(`${base(studyId)}/datasets/${datasetId}`, this.quiet);
  }

  fit(studyId: string, datasetId: string, spec: DatasetFitSpec): Observable<{ fitId: string }> {
    return this.http.post<{ fitId: string }>(
      `${base(studyId)}/datasets/${datasetId}/fits`,
      { spec },
      this.quiet,
    );
  }

  getFit(studyId: string, fitId: string): Observable<DatasetFitResource> {
    return this.http.get<DatasetFitResource>(`${base(studyId)}/dataset-fits/${fitId}`, this.quiet);
  }
}

function base(studyId: string): string {
  return `/api/studies/${encodeURIComponent(studyId)}`;
}
