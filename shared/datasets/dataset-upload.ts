import { z } from 'zod';
import { storableText } from '../storable/storable-text';

/** Largest file a dataset may come from, and the most one chunk request may carry. */
export const maxDatasetBytes = 2 * 1024 ** 3;
export const maxChunkBytes = 8 * 1024 ** 2;

/** The file kinds a dataset may come from, told by the file name. */
export const datasetFormats = ['csv', 'xlsx'] as const;
export type DatasetFormat = (typeof datasetFormats)[number];

/** Body of POST /api/studies/:studyId/dataset-uploads: announce a file before its chunks. */
export const uploadStartSchema = z.strictObject({
  fileName: storableText()
    .min(1, 'Name the file')
    .max(200, 'At most 200 characters')
    .regex(/\.(csv|xlsx)$/i, 'Only CSV (.csv) or Excel workbook (.xlsx) files can be imported'),
  totalBytes: z
    .int('A whole number of bytes')
    .min(1, 'The file is empty')
    .max(maxDatasetBytes, 'Files up to 2 GB can be imported'),
});
export type UploadStart = z.infer<typeof uploadStartSchema>;

/** What the server holds of an upload: the progress is its own count of stored bytes. */
export const uploadStateSchema = z.object({
  uploadId: z.uuid(),
  fileName: z.string(),
  format: z.enum(datasetFormats),
  totalBytes: z.number(),
  receivedBytes: z.number(),
  complete: z.boolean(),
  expiresAt: z.string(),
});
export type UploadState = z.infer<typeof uploadStateSchema>;

/** The first rows of an uploaded file with a suggested mapping. */
export const uploadPreviewSchema = z.object({
  headers: z.array(z.string()),
  rows: z.array(z.array(z.string())),
  suggested: z.array(
    z.object({ source: z.string(), name: z.string(), role: z.string(), type: z.string() }),
  ),
});
export type UploadPreview = z.infer<typeof uploadPreviewSchema>;
