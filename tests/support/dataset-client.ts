import type { DatasetResource } from '@shared/datasets/dataset-resource';
import type { DatasetFitResource } from '@shared/datasets/dataset-fit-resource';
import type { SignedInAgent } from './signed-in-agent';

/** Announces a file and sends it in chunks of `chunkBytes`, as the browser does. */
export async function uploadFile(
  agent: SignedInAgent,
  studyId: string,
  fileName: string,
  bytes: Buffer,
  chunkBytes = 64 * 1024,
): Promise<string> {
  const started = await agent.post(`/api/studies/${studyId}/dataset-uploads`, {
    fileName,
    totalBytes: bytes.length,
  });
  if (started.status !== 201) throw new Error(`upload refused: ${JSON.stringify(started.body)}`);
  const uploadId = started.body.uploadId as string;
  for (let offset = 0; offset < bytes.length; offset += chunkBytes) {
    const sent = await sendChunk(
      agent,
      studyId,
      uploadId,
      offset,
      bytes.subarray(offset, offset + chunkBytes),
    );
    if (sent.status !== 200) throw new Error(`chunk refused: ${JSON.stringify(sent.body)}`);
  }
  return uploadId;
}

export function sendChunk(
  agent: SignedInAgent,
  studyId: string,
  uploadId: string,
  offset: number,
  chunk: Buffer,
) {
  return agent
    .put(`/api/studies/${studyId}/dataset-uploads/${uploadId}?offset=${offset}`)
    .set('Content-Type', 'application/octet-stream')
    .send(chunk);
}

/** Polls a dataset until its import has finished. */
export async function importedDataset(
  agent: SignedInAgent,
  studyId: string,
  datasetId: string,
): Promise<DatasetResource> {
  for (let i = 0; i < 1200; i++) {
    const response = await agent.get(`/api/studies/${studyId}/datasets/${datasetId}`);
    const dataset = response.body as DatasetResource;
    if (dataset.status !== 'importing') return dataset;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error('the import did not finish within 120 s');
}

/** Polls a dataset fit until it is done or failed. */
export async function settledFit(
  agent: SignedInAgent,
  studyId: string,
  fitId: string,
): Promise<DatasetFitResource> {
  for (let i = 0; i < 3000; i++) {
    const response = await agent.get(`/api/studies/${studyId}/dataset-fits/${fitId}`);
    const fit = response.body as DatasetFitResource;
    if (fit.status === 'done' || fit.status === 'failed') return fit;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error('the fit did not finish within 300 s');
}
