import { createHash } from 'node:crypto';
import { and, eq } from 'drizzle-orm';
import { suggestedName } from '@shared/datasets/check-dataset-row';
import { typeOfRole, type ColumnRole } from '@shared/datasets/dataset-columns';
import type { DatasetImport } from '@shared/datasets/dataset-resource';
import type { DatasetFormat, UploadPreview } from '@shared/datasets/dataset-upload';
import type { Database } from '../db/database';
import { datasets } from '../db/schema';
import { HttpError } from '../http/http-error';
import { fileRecords, FileStructureError } from './file-records';
import { findUpload, uploadBytes } from './upload-repository';

/** Rows shown in a preview. */
const previewRows = 20;

/**
 * Accepts an import of a complete upload: hashes its bytes (streamed from the stored chunks)
 * and refuses a file this study already holds (409 naming that dataset). A failed import of the
 * same file is replaced. Answers the new dataset's id; a worker then imports it.
 */
export async function acceptImport(
  db: Database,
  studyId: string,
  request: DatasetImport,
  userId: string,
): Promise<string> {
  const upload = await findUpload(db, studyId, request.uploadId);
  if (upload.receivedBytes !== upload.totalBytes) {
    throw new HttpError(
      409,
      'upload-incomplete',
      `The server holds ${upload.receivedBytes} of ${upload.totalBytes} bytes; finish the upload first.`,
      [{ path: 'uploadId', message: 'The upload is not complete' }],
    );
  }
  const hash = createHash('sha256');
  for await (const chunk of uploadBytes(db, upload.id)) hash.update(chunk);
  const contentHash = hash.digest('hex');
  return db.transaction(async (tx) => {
    const [existing] = await tx
      .select({ id: datasets.id, name: datasets.name, status: datasets.status })
      .from(datasets)
      .where(and(eq(datasets.studyId, studyId), eq(datasets.contentHash, contentHash)))
      .for('update');
    if (existing && existing.status !== 'failed') {
      throw new HttpError(
        409,
        'duplicate-dataset',
        `This file is already in the study as dataset "${existing.name}"; it is not stored twice.`,
        [{ path: 'uploadId', message: `Same content as dataset ${existing.id}` }],
      );
    }
    if (existing) await tx.delete(datasets).where(eq(datasets.id, existing.id));
    const [row] = await tx
      .insert(datasets)
      .values({
        studyId,
        uploadId: upload.id,
        name: request.name,
        fileName: upload.fileName,
        columns: request.columns,
        contentHash,
        totalBytes: upload.totalBytes,
        importedBy: userId,
      })
      .returning({ id: datasets.id });
    return row.id;
  });
}

/** The header and first rows of an upload (read from its first chunks), with a mapping to start from. */
export async function previewUpload(
  db: Database,
  studyId: string,
  uploadId: string,
): Promise<UploadPreview> {
  const upload = await findUpload(db, studyId, uploadId);
  if (upload.receivedBytes === 0) {
    throw new HttpError(409, 'upload-incomplete', 'No bytes of the file have arrived yet.');
  }
  const records: string[][] = [];
  try {
    for await (const record of fileRecords(
      upload.format as DatasetFormat,
      uploadBytes(db, uploadId),
    )) {
      records.push(record.values);
      if (records.length > previewRows) break;
    }
  } catch (error) {
    // A preview of a partial upload may end inside a record; show what was read.
    if (!(error instanceof FileStructureError) || records.length === 0) {
      const message = error instanceof Error ? error.message : 'The file could not be read.';
      throw new HttpError(400, 'invalid-file', message, [{ path: 'file', message }]);
    }
  }
  if (records.length === 0) {
    throw new HttpError(400, 'invalid-file', 'The file is empty.', [
      { path: 'file', message: 'The file is empty' },
    ]);
  }
  const [headers, ...rows] = records;
  const taken = new Set<string>();
  const suggested = headers.map((source) => {
    const name = suggestedName(source, taken);
    taken.add(name);
    const role = guessRole(source);
    return { source, name, role, type: typeOfRole(role) };
  });
  return { headers, rows, suggested };
}

/** A first guess at a column's role from its header; the researcher confirms or changes it. */
function guessRole(header: string): ColumnRole {
  const text = header.toLowerCase();
  const guesses: [RegExp, ColumnRole][] = [
    [/date|day|start/, 'date'],
    [/other|rival|competit|cross/, 'other-price'],
    [/price|tariff/, 'price'],
    [/quantity|units|qty|sales|volume/, 'quantity'],
    [/income/, 'income'],
    [/weight/, 'weight'],
    [/outlet|region|store|shop|week|period|district/, 'grouping'],
    [/instrument|cost/, 'instrument'],
  ];
  return guesses.find(([pattern]) => pattern.test(text))?.[1] ?? 'covariate';
}
