import { firstValueFrom } from 'rxjs';
import type { UploadState } from '@shared/datasets/dataset-upload';
import type { DatasetsApi } from './datasets-api';

/** Bytes per chunk: small enough to resend cheaply after a dropped connection. */
const chunkBytes = 4 * 1024 * 1024;

/**
 * Sends a file in chunks from the server's own count of stored bytes. When a chunk fails (the
 * connection dropped), it asks the server how much it holds and resumes there, a few times.
 */
export async function uploadFile(
  api: DatasetsApi,
  studyId: string,
  file: File,
  progress: (state: UploadState) => void,
): Promise<UploadState> {
  let state = await firstValueFrom(api.startUpload(studyId, file.name, file.size));
  progress(state);
  let retries = 0;
  while (!state.complete) {
    const offset = state.receivedBytes;
    try {
      state = await firstValueFrom(
        api.sendChunk(studyId, state.uploadId, offset, file.slice(offset, offset + chunkBytes)),
      );
      retries = 0;
    } catch (error) {
      if (++retries > 5 || !isTransient(error)) throw error;
      await new Promise((r) => setTimeout(r, 1000 * retries));
      state = await firstValueFrom(api.uploadState(studyId, state.uploadId));
    }
    progress(state);
  }
  return state;
}

function isTransient(error: unknown): boolean {
  const status = (error as { status?: number }).status ?? 0;
  return status === 0 || status === 409 || status >= 502;
}
