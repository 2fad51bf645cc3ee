import { z } from 'zod';
import { storableText } from '../storable/storable-text';
import { columnMappingListSchema, columnMappingSchema } from './dataset-columns';

/** Body of POST /api/studies/:studyId/datasets: import a complete upload with a mapping. */
export const datasetImportSchema = z.strictObject({
  uploadId: z.uuid({ error: 'Choose an uploaded file' }),
  name: storableText().trim().min(1, 'Name the dataset').max(120, 'At most 120 characters'),
  columns: columnMappingListSchema,
});
export type DatasetImport = z.infer<typeof datasetImportSchema>;

/** One problem of an import, where it is in the file. */
export const importProblemSchema = z.object({
  /** 1-based file line (the header is line 1); null for a problem of the whole file. */
  line: z.number().nullable(),
  column: z.string().nullable(),
  message: z.string(),
});
export type ImportProblem = z.infer<typeof importProblemSchema>;

export const datasetStatuses = ['importing', 'imported', 'failed'] as const;

/** A dataset as listed and polled. */
export const datasetResourceSchema = z.object({
  id: z.uuid(),
  studyId: z.uuid(),
  name: z.string(),
  fileName: z.string(),
  status: z.enum(datasetStatuses),
  rowCount: z.number(),
  /** Bytes of the file read so far by the import (its progress). */
  bytesRead: z.number(),
  totalBytes: z.number(),
  columns: z.array(columnMappingSchema),
  contentHash: z.string(),
  problems: z.array(importProblemSchema),
  importedBy: z.string().nullable(),
  createdAt: z.string(),
  importedAt: z.string().nullable(),
});
export type DatasetResource = z.infer<typeof datasetResourceSchema>;
