import type { InterviewStatus } from '@shared/interviews/interview-status';
import { interviewQualityFlags } from '@shared/field-sync/quality/interview-quality-flags';
import {
  checkInterview,
  rawIdOf,
  type CheckContext,
  type CheckedInterview,
} from './check-interview';
import { decideOnExisting } from './existing-decision';
import type { ExistingInterview } from './existing-interviews';
import {
  fingerprintOf,
  interviewRow,
  photoRows,
  type InterviewInsert,
  type PhotoInsert,
} from './interview-row';
import { respondentSlot } from './respondent-matches';
import { rejection, type Rejection } from './sync-rejection';

/** What the batch will do with one item. */
export type PlannedItem =
  | { kind: 'rejected'; index: number; id: string | null; rejection: Rejection }
  | { kind: 'duplicate'; index: number; id: string; status: InterviewStatus }
  | {
      kind: 'insert' | 'resubmit';
      index: number;
      id: string;
      row: InterviewInsert;
      photos: PhotoInsert[];
      /** Computed only when needed: when the id turns out to be taken. */
      fingerprint: () => string;
    };

/** An item the batch writes: a new interview or a returned one's correction. */
export type StoredItem = Extract<PlannedItem, { kind: 'insert' | 'resubmit' }>;

/** What was read from the database for the whole batch before deciding. */
export interface BatchFacts extends CheckContext {
  enumeratorId: string;
  existing: ReadonlyMap<string, ExistingInterview>;
  photoOwners: ReadonlyMap<string, string>;
  respondentMatches: ReadonlyMap<string, readonly string[]>;
  receivedAt: Date;
}

/**
 * Decides every item of a batch, in order, without writing anything: refused (with reasons),
 * already had, to insert, or a returned interview's correction. Items earlier in the batch
 * count for later ones: a repeated id, a photo claimed twice, the same respondent twice.
 */
export function planSyncBatch(items: readonly unknown[], facts: BatchFacts): PlannedItem[] {
  const seenIds = new Set<string>();
  const claimedPhotos = new Map<string, string>();
  const batchRespondents = new Map<string, string[]>();
  return items.map((raw, index): PlannedItem => {
    const checked = checkInterview(raw, facts);
    if (!('interview' in checked)) return rejectedItem(index, raw, checked);
    const { interview } = checked;
    if (seenIds.has(interview.id)) {
      return rejectedItem(
        index,
        raw,
        rejection('repeated-in-batch', [
          { path: 'id', message: 'An earlier item of this batch has this id' },
        ]),
      );
    }
    seenIds.add(interview.id);
    const photoProblem = photoClaims(checked, facts.photoOwners, claimedPhotos);
    if (photoProblem) return rejectedItem(index, raw, photoProblem);
    const existing = facts.existing.get(interview.id);
    let kind: 'insert' | 'resubmit' = 'insert';
    if (existing) {
      const decision = decideOnExisting(existing, {
        ...interview,
        enumeratorId: facts.enumeratorId,
        fingerprint: fingerprintOf(checked),
      });
      if (decision.kind === 'rejected') return rejectedItem(index, raw, decision.rejection);
      if (decision.kind === 'duplicate')
        return { kind: 'duplicate', index, id: interview.id, status: decision.status };
      kind = 'resubmit';
    }
    const row = acceptedRow(checked, facts, batchRespondents);
    return {
      kind,
      index,
      id: interview.id,
      row,
      photos: photoRows(interview.id, interview.photos),
      fingerprint() {
        return fingerprintOf(checked);
      },
    };
  });
}

function rejectedItem(index: number, raw: unknown, why: Rejection): PlannedItem {
  return { kind: 'rejected', index, id: rawIdOf(raw), rejection: why };
}

/** A photo id may belong to one interview only, across the store and the batch. */
function photoClaims(
  { interview }: CheckedInterview,
  owners: ReadonlyMap<string, string>,
  claimed: Map<string, string>,
): Rejection | null {
  const issues = interview.photos.flatMap((photo, i) => {
    const owner = owners.get(photo.photoId) ?? claimed.get(photo.photoId);
    return owner !== undefined && owner !== interview.id
      ? [{ path: `photos.${i}.photoId`, message: 'This photo id belongs to another interview' }]
      : [];
  });
  if (issues.length > 0) return rejection('photo-manifest', issues);
  for (const photo of interview.photos) claimed.set(photo.photoId, interview.id);
  return null;
}

function acceptedRow(
  checked: CheckedInterview,
  facts: BatchFacts,
  batchRespondents: Map<string, string[]>,
): InterviewInsert {
  const { interview, version, point } = checked;
  let sameRespondentIds: string[] = [];
  if (interview.respondentKey) {
    const slot = respondentSlot(interview.studyId, interview.respondentKey);
    const stored = facts.respondentMatches.get(slot);
    const earlier = batchRespondents.get(slot);
    if (stored || earlier) {
      const others = new Set([...(stored ?? []), ...(earlier ?? [])]);
      others.delete(interview.id);
      sameRespondentIds = [...others];
    }
    if (earlier) earlier.push(interview.id);
    else batchRespondents.set(slot, [interview.id]);
  }
  const flags = interviewQualityFlags({
    definition: version.definition,
    answers: interview.answers,
    startedAt: interview.startedAt,
    finishedAt: interview.finishedAt,
    gps: interview.gps,
    point,
    sameRespondentIds,
  });
  return interviewRow(checked, facts.enumeratorId, flags, facts.receivedAt);
}
