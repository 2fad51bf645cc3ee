import { sql } from 'drizzle-orm';
import {
  bigint,
  check,
  customType,
  index,
  integer,
  jsonb,
  pgEnum,
  pgTable,
  primaryKey,
  text,
  timestamp,
  unique,
  uuid,
} from 'drizzle-orm/pg-core';
import { datasetStatuses } from '@shared/datasets/dataset-resource';
import { fitStatuses } from '@shared/analysis/fit-status';
import { studies } from './studies';
import { users } from './users';

const bytea = customType<{ data: Buffer }>({ dataType: () => 'bytea' });

/**
 * A file on its way in, announced before its bytes. The chunks are stored in PostgreSQL (not
 * in a web process) so any process takes the next chunk, and a dropped connection resumes at
 * the server's own count of stored bytes. An upload nobody touched until `expiresAt` is
 * deleted with its chunks.
 */
export const datasetUploads = pgTable(
  'dataset_uploads',
  {
    id: uuid().primaryKey().defaultRandom(),
    studyId: uuid()
      .notNull()
      .references(() => studies.id, { onDelete: 'cascade' }),
    fileName: text().notNull(),
    format: text().notNull(),
    totalBytes: bigint({ mode: 'number' }).notNull(),
    receivedBytes: bigint({ mode: 'number' }).notNull().default(0),
    createdBy: uuid().references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    expiresAt: timestamp({ withTimezone: true }).notNull(),
  },
  (table) => [
    index('dataset_uploads_expiry').on(table.expiresAt),
    check('dataset_uploads_bytes', sql`${table.receivedBytes} between 0 and ${table.totalBytes}`),
  ],
);

/** One stored chunk of an upload, at its byte offset. */
export const datasetUploadChunks = pgTable(
  'dataset_upload_chunks',
  {
    uploadId: uuid()
      .notNull()
      .references(() => datasetUploads.id, { onDelete: 'cascade' }),
    byteOffset: bigint({ mode: 'number' }).notNull(),
    bytes: bytea().notNull(),
  },
  (table) => [primaryKey({ columns: [table.uploadId, table.byteOffset] })],
);

export const datasetStatusEnum = pgEnum('dataset_status', datasetStatuses);

/**
 * A table a researcher brought into a study: its mapping, the SHA-256 of the file it came
 * from (one file is stored once per study), and its rows in their own typed table
 * `study_data.dataset_<id>` (the import creates it, deleting the dataset drops it).
 */
export const datasets = pgTable(
  'datasets',
  {
    id: uuid().primaryKey().defaultRandom(),
    studyId: uuid()
      .notNull()
      .references(() => studies.id, { onDelete: 'cascade' }),
    uploadId: uuid().references(() => datasetUploads.id, { onDelete: 'set null' }),
    name: text().notNull(),
    fileName: text().notNull(),
    status: datasetStatusEnum().notNull().default('importing'),
    columns: jsonb().notNull(),
    contentHash: text().notNull(),
    rowCount: bigint({ mode: 'number' }).notNull().default(0),
    bytesRead: bigint({ mode: 'number' }).notNull().default(0),
    totalBytes: bigint({ mode: 'number' }).notNull(),
    problems: jsonb().notNull().default([]),
    importedBy: uuid().references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    importedAt: timestamp({ withTimezone: true }),
  },
  (table) => [
    unique('datasets_content').on(table.studyId, table.contentHash),
    index('datasets_study').on(table.studyId, table.createdAt),
  ],
);

export const datasetFitStatusEnum = pgEnum('dataset_fit_status', fitStatuses);

/**
 * An observed-demand fit on a dataset, run in the database by a worker. `datasetId` becomes
 * null when the dataset is deleted, so a fit that was running says why it has no result.
 */
export const datasetFits = pgTable(
  'dataset_fits',
  {
    id: uuid().primaryKey().defaultRandom(),
    studyId: uuid()
      .notNull()
      .references(() => studies.id, { onDelete: 'cascade' }),
    datasetId: uuid().references(() => datasets.id, { onDelete: 'set null' }),
    spec: jsonb().notNull(),
    status: datasetFitStatusEnum().notNull().default('queued'),
    progress: integer().notNull().default(0),
    result: jsonb(),
    error: jsonb(),
    dataHash: text(),
    createdBy: uuid().references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    finishedAt: timestamp({ withTimezone: true }),
  },
  (table) => [index('dataset_fits_study').on(table.studyId, table.createdAt)],
);
