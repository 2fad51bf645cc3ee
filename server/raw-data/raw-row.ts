import { qualityFlagKinds } from '@shared/field-sync/quality/quality-flag';
import type { RawCell } from '@shared/raw-data/answer-parts';
import { interviewColumns, type RawDataLayout } from '@shared/raw-data/raw-data-layout';
import type { InterviewWeights } from './raked-cell-weights';

/** One interview as the download's cursor reads it. */
export interface InterviewRecord {
  id: string;
  version_id: string;
  status: string;
  review_note: string | null;
  reviewed_at: Date | null;
  route_id: string | null;
  route_name: string | null;
  point_id: string | null;
  point_code: string | null;
  point_name: string | null;
  region: string | null;
  enumerator_id: string | null;
  enumerator_name: string | null;
  started_at: Date;
  finished_at: Date;
  received_at: Date;
  latitude: number | null;
  longitude: number | null;
  gps_accuracy_m: number | null;
  flags: unknown;
  photo_count: number;
  answers: Record<string, unknown> | null;
  /** Stored photos: id → object key. */
  photos: Record<string, string>;
}

/** Where the facts end and the answers begin. */
const answersStart = interviewColumns.length;

/**
 * The cells of one interview in the layout's column order. `photoLink` turns a stored photo's
 * object key into a link; a photo not (yet) stored stays empty.
 */
export async function rawRow(
  record: InterviewRecord,
  layout: RawDataLayout,
  version: number | undefined,
  photoLink: (objectKey: string) => Promise<string>,
  weights: InterviewWeights | null,
): Promise<RawCell[]> {
  const flagKinds = new Set(
    Array.isArray(record.flags) ? (record.flags as { kind?: unknown }[]).map((f) => f.kind) : [],
  );
  const cells: RawCell[] = [
    record.id,
    version ?? null,
    record.status,
    record.review_note,
    iso(record.reviewed_at),
    record.route_id,
    record.route_name,
    record.point_id,
    record.point_code,
    record.point_name,
    record.region,
    record.enumerator_id,
    record.enumerator_name,
    iso(record.started_at),
    iso(record.finished_at),
    iso(record.received_at),
    (record.finished_at.getTime() - record.started_at.getTime()) / 1000,
    record.latitude,
    record.longitude,
    record.gps_accuracy_m,
    ...qualityFlagKinds.map((kind) => flagKinds.has(kind)),
    record.photo_count,
    Object.keys(record.photos).length,
  ];
  cells.length = layout.columns.length;
  cells.fill(null, answersStart);
  const answers = record.answers ?? {};
  for (const placed of layout.partsByVersion.get(record.version_id) ?? []) {
    const answer = answers[placed.blockId];
    if (typeof answer !== 'object' || answer === null) continue;
    const value = placed.part.read(answer as Record<string, unknown>);
    if (placed.part.photo) {
      const key = typeof value === 'string' ? record.photos[value] : undefined;
      cells[placed.column] = key === undefined ? null : await photoLink(key);
    } else {
      cells[placed.column] = value;
    }
  }
  if (weights) {
    cells[layout.columns.length - 1] = weights.weightOf(record.version_id, answers, record.region);
  }
  return cells;
}

function iso(date: Date | null): string | null {
  return date === null ? null : date.toISOString();
}
