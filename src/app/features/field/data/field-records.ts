import type { FieldAssignments } from '@shared/field-sync/field-assignments';
import type { FieldInterview, GpsFix } from '@shared/field-sync/field-interview';
import type { FieldNotice } from '@shared/field-sync/field-notice';
import type { FieldIssue } from '@shared/http/api-error';
import type { BidLevel } from '@shared/questionnaire/bid-design';

/** The last assignments the server sent, kept whole (one row, key `current`). */
export interface CachedAssignments {
  readonly key: 'current';
  readonly payload: FieldAssignments;
  readonly fetchedAt: string;
}

/**
 * An interview being run on the device. Saved on every answer with the step the runner shows,
 * so a closed tab or a dead battery resumes at the same question.
 */
export interface DraftInterview {
  readonly id: string;
  readonly studyId: string;
  readonly questionnaireVersionId: string;
  readonly routeId: string;
  readonly pointId: string;
  readonly startedAt: string;
  /** Index of the block on screen; the block count means the closing screen. */
  step: number;
  answers: Record<string, unknown>;
  /** The bid drawn for each dichotomous-choice block, kept so a resumed interview asks the same. */
  bids: Record<string, BidLevel>;
  gps: GpsFix | null;
  /**
   * The one-way code of the respondent reference the enumerator typed (`respondentKeyFor`);
   * the typed text itself is never stored. Null when none was given; absent on drafts saved
   * before the device asked for one.
   */
  respondentKey?: string | null;
  /** When this is the correction of a returned interview: the `reviewedAt` of that return. */
  returnedAt: string | null;
  updatedAt: string;
}

/**
 * Where a finished interview stands on its way to the server: waiting to be sent, sent and
 * accepted but with photos still to upload, complete (accepted and all photos stored), refused
 * by the server, or returned by a supervisor for correction.
 */
export type OutboxState = 'waiting' | 'photos' | 'complete' | 'rejected' | 'returned';

/** A finished interview, exactly as it is (or was) sent, and the server's answer. */
export interface OutboxEntry {
  readonly id: string;
  readonly interview: FieldInterview;
  readonly pointId: string;
  readonly routeId: string;
  state: OutboxState;
  queuedAt: string;
  answeredAt: string | null;
  /** Server status once accepted (`received`, `flagged`…), or the review status. */
  serverStatus: string | null;
  /** Why the server refused it, or the supervisor's note on a return. */
  reason: string | null;
  issues: FieldIssue[];
}

/** A downscaled photo waiting for (or done with) its resumable upload. */
export interface StoredPhoto {
  readonly id: string;
  readonly interviewId: string;
  readonly blob: Blob;
  readonly sha256: string;
  readonly byteSize: number;
  readonly contentType: 'image/jpeg';
  readonly takenAt: string;
  /** Bytes the server confirmed so far. */
  uploadedBytes: number;
  storedAt: string | null;
}

/** One line of the sync page's history. */
export interface SyncLogEntry {
  id?: number;
  readonly at: string;
  readonly ok: boolean;
  readonly message: string;
}

/** What the device counted at a point that is not an interview: refusals, and bids drawn. */
export interface PointTally {
  readonly pointId: string;
  refusals: number;
  bidsDrawn: number;
}

/** A supervisor's return or rejection, as the server last sent it. */
export type StoredNotice = FieldNotice;

/** Small named values: the last successful sync, the last assignments refresh. */
export interface MetaEntry {
  readonly key: string;
  readonly value: string;
}
