import {
  customType,
  index,
  integer,
  pgTable,
  primaryKey,
  text,
  timestamp,
  uuid,
} from 'drizzle-orm/pg-core';
import { interviews } from './interviews';

const bytea = customType<{ data: Buffer }>({ dataType: () => 'bytea' });

/**
 * A photo an interview refers to. The device names it (uuid) and states its SHA-256 and size up
 * front; the bytes arrive in chunks and are checked against both before they reach object storage.
 */
export const interviewPhotos = pgTable(
  'interview_photos',
  {
    id: uuid().primaryKey(),
    interviewId: uuid()
      .notNull()
      .references(() => interviews.id, { onDelete: 'cascade' }),
    sha256: text().notNull(),
    byteSize: integer().notNull(),
    contentType: text(),
    receivedBytes: integer().notNull().default(0),
    objectKey: text(),
    storedAt: timestamp({ withTimezone: true }),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [index('interview_photos_interview').on(table.interviewId)],
);

/** Bytes of an upload in progress, so a cut connection resumes where it stopped. */
export const photoUploadChunks = pgTable(
  'photo_upload_chunks',
  {
    photoId: uuid()
      .notNull()
      .references(() => interviewPhotos.id, { onDelete: 'cascade' }),
    offset: integer().notNull(),
    data: bytea().notNull(),
  },
  (table) => [primaryKey({ columns: [table.photoId, table.offset] })],
);
