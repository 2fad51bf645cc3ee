import { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import type pg from 'pg';
import { from as copyFrom } from 'pg-copy-streams';
import type { InterviewInsert, PhotoInsert } from './interview-row';

/** The columns COPY fills, in the order each line lists them. */
const columns: readonly (keyof InterviewInsert)[] = [
  'id',
  'studyId',
  'questionnaireVersionId',
  'routeId',
  'pointId',
  'enumeratorId',
  'status',
  'answers',
  'flags',
  'startedAt',
  'finishedAt',
  'receivedAt',
  'latitude',
  'longitude',
  'gpsAccuracyM',
  'respondentKey',
  'photoCount',
  'completeAt',
];
const snakeCase = (name: string) => name.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`);
const copyStatement = `COPY interviews (${columns.map(snakeCase).join(', ')}) FROM STDIN`;

/** One field in COPY's text format: \N for NULL; backslash, tab and line breaks escaped. */
function copyField(value: unknown): string {
  if (value === null || value === undefined) return '\\N';
  let text: string;
  if (value instanceof Date) text = value.toISOString();
  else if (typeof value === 'string') text = value;
  else if (typeof value === 'number' || typeof value === 'boolean') text = String(value);
  else text = JSON.stringify(value);
  return text.replace(/[\\\t\n\r]/g, (c) =>
    c === '\\' ? '\\\\' : c === '\t' ? '\\t' : c === '\n' ? '\\n' : '\\r',
  );
}

/** The rows as COPY text, one line per interview. */
export function interviewCopyText(rows: readonly InterviewInsert[]): string {
  return rows.map((row) => columns.map((c) => copyField(row[c])).join('\t') + '\n').join('');
}

/** SQLSTATE of a unique violation: an id stored meanwhile by another request. */
const uniqueViolation = '23505';

/**
 * Stores new interviews (and the photo rows they declare) with one `COPY`, the cheapest way
 * into PostgreSQL: parsing JSON parameters costs the database more than storing the rows. COPY
 * has no ON CONFLICT, so this is the optimistic path for ids nobody stored yet (the batch was
 * checked against the table just before): it answers null, having stored nothing, when an id
 * turned out to be taken — a concurrent request got there first — and the caller then takes the
 * INSERT … ON CONFLICT path that judges each id. Photos go in the same transaction.
 */
export async function copyInterviewRows(
  pool: pg.Pool,
  rows: readonly InterviewInsert[],
  photos: readonly PhotoInsert[],
): Promise<string[] | null> {
  if (rows.length === 0) return [];
  const client = await pool.connect();
  // COPY alone is one atomic statement; photo rows need a transaction around both.
  const transaction = photos.length > 0;
  try {
    if (transaction) await client.query('BEGIN');
    await pipeline(Readable.from([interviewCopyText(rows)]), client.query(copyFrom(copyStatement)));
    if (transaction) {
      await client.query(
        `INSERT INTO interview_photos (id, interview_id, sha256, byte_size, content_type)
         SELECT p.id, p."interviewId", p.sha256, p."byteSize", p."contentType"
         FROM jsonb_to_recordset($1::jsonb) AS p(id uuid, "interviewId" uuid, sha256 text,
           "byteSize" int, "contentType" text)
         ON CONFLICT (id) DO NOTHING`,
        [JSON.stringify(photos)],
      );
      await client.query('COMMIT');
    }
    return rows.map((row) => row.id);
  } catch (error) {
    if (transaction) await client.query('ROLLBACK').catch(() => undefined);
    if ((error as { code?: string }).code === uniqueViolation) return null;
    throw error;
  } finally {
    client.release();
  }
}
