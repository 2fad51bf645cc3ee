import { Injectable, inject } from '@angular/core';
import type { FieldQuestionnaireVersion } from '@shared/field-sync/field-assignments';
import type { PhotoManifestEntry } from '@shared/field-sync/photo-manifest';
import { assignBid } from '@shared/questionnaire/bid-assignment';
import type { BidLevel } from '@shared/questionnaire/bid-design';
import type { BlockOfKind } from '@shared/questionnaire/block';
import { GpsReader } from '../capture/gps-reader';
import type { DraftInterview, OutboxEntry } from '../data/field-records';
import { FieldStore } from '../data/field-store';
import { finishedInterview } from './finished-interview';

/** Where a new interview happens and with which questionnaire version. */
export interface InterviewPlace {
  readonly studyId: string;
  readonly routeId: string;
  readonly pointId: string;
  readonly questionnaireVersionId: string;
}

/**
 * Interviews in progress on the device. Each change is one IndexedDB transaction that
 * completes before the caller moves the screen on, so nothing is lost when the tab closes.
 */
@Injectable({ providedIn: 'root' })
export class InterviewDrafts {
  private readonly store = inject(FieldStore);
  private readonly gps = inject(GpsReader);

  async start(place: InterviewPlace): Promise<DraftInterview> {
    const now = new Date().toISOString();
    const draft: DraftInterview = {
      id: crypto.randomUUID(),
      ...place,
      startedAt: now,
      step: 0,
      answers: {},
      bids: {},
      gps: null,
      respondentKey: null,
      returnedAt: null,
      updatedAt: now,
    };
    await this.store.db.drafts.add(draft);
    void this.recordBackgroundFix(draft.id);
    return draft;
  }

  get(id: string): Promise<DraftInterview | undefined> {
    return this.store.db.drafts.get(id);
  }

  /** Stores one block's answer (undefined removes it) and the step the runner shows next. */
  async saveAnswer(id: string, blockId: string, answer: unknown, step: number): Promise<void> {
    const db = this.store.db;
    await db.transaction('rw', db.drafts, async () => {
      const draft = await db.drafts.get(id);
      if (!draft) throw new Error('This interview is no longer on the device');
      const answers = { ...draft.answers };
      if (answer === undefined) delete answers[blockId];
      else answers[blockId] = answer;
      await db.drafts.put({ ...draft, answers, step, updatedAt: new Date().toISOString() });
    });
  }

  /** Stores the respondent key made on the device (null removes it); never the typed reference. */
  async saveRespondentKey(id: string, respondentKey: string | null): Promise<void> {
    const updated = await this.store.db.drafts.update(id, {
      respondentKey,
      updatedAt: new Date().toISOString(),
    });
    if (updated === 0) throw new Error('This interview is no longer on the device');
  }

  /**
   * The bid for a dichotomous-choice block: drawn once per interview with `assignBid`, the
   * site being the point and the respondent index the number of bids drawn there so far.
   */
  async bidFor(id: string, block: BlockOfKind<'dichotomous-choice'>): Promise<BidLevel> {
    const db = this.store.db;
    return db.transaction('rw', db.drafts, db.tallies, async () => {
      const draft = await db.drafts.get(id);
      if (!draft) throw new Error('This interview is no longer on the device');
      const held = draft.bids[block.id];
      if (held) return held;
      const tally = (await db.tallies.get(draft.pointId)) ?? {
        pointId: draft.pointId,
        refusals: 0,
        bidsDrawn: 0,
      };
      const bid = assignBid(block.bidDesign, draft.pointId, tally.bidsDrawn);
      await db.tallies.put({ ...tally, bidsDrawn: tally.bidsDrawn + 1 });
      await db.drafts.put({ ...draft, bids: { ...draft.bids, [block.id]: bid } });
      return bid;
    });
  }

  /** No consent: the interview and its photos are dropped; only the refusal is counted. */
  async refuse(id: string): Promise<void> {
    const db = this.store.db;
    await db.transaction('rw', db.drafts, db.photos, db.tallies, async () => {
      const draft = await db.drafts.get(id);
      if (!draft) return;
      await db.drafts.delete(id);
      await db.photos.where('interviewId').equals(id).delete();
      if (draft.returnedAt) return;
      const tally = await db.tallies.get(draft.pointId);
      await db.tallies.put({
        pointId: draft.pointId,
        bidsDrawn: tally?.bidsDrawn ?? 0,
        refusals: (tally?.refusals ?? 0) + 1,
      });
    });
  }

  /** Abandons an interview in progress, keeping nothing (not even a refusal). */
  async discard(id: string): Promise<void> {
    const db = this.store.db;
    await db.transaction('rw', db.drafts, db.photos, async () => {
      await db.drafts.delete(id);
      await db.photos.where('interviewId').equals(id).delete();
    });
  }

  /** Moves the finished interview into the outbox, in the same transaction as the draft goes. */
  async finish(id: string, version: FieldQuestionnaireVersion): Promise<OutboxEntry> {
    const db = this.store.db;
    return db.transaction('rw', db.drafts, db.photos, db.outbox, async () => {
      const draft = await db.drafts.get(id);
      if (!draft) throw new Error('This interview is no longer on the device');
      const manifest = await this.manifestOf(draft);
      const { interview, unusedPhotoIds } = finishedInterview(
        draft,
        version.definition.blocks,
        manifest,
        new Date().toISOString(),
      );
      const entry: OutboxEntry = {
        id,
        interview,
        pointId: draft.pointId,
        routeId: draft.routeId,
        state: 'waiting',
        queuedAt: interview.finishedAt,
        answeredAt: null,
        serverStatus: null,
        reason: null,
        issues: [],
      };
      await db.photos.bulkDelete(unusedPhotoIds);
      await db.outbox.put(entry);
      await db.drafts.delete(id);
      return entry;
    });
  }

  /**
   * Opens a returned (or refused) interview for correction: a draft with its answers and bids,
   * sent again under the same id — with the return it answers, when a supervisor returned it.
   */
  async reopen(
    entry: OutboxEntry,
    version: FieldQuestionnaireVersion,
    returnedAt: string | null,
  ): Promise<DraftInterview> {
    const { interview } = entry;
    const bids: Record<string, BidLevel> = {};
    for (const block of version.definition.blocks) {
      const answer = interview.answers[block.id] as { bidMinor?: number } | undefined;
      if (block.kind !== 'dichotomous-choice' || !answer) continue;
      const level = block.bidDesign.levels.find((l) => l.bidMinor === answer.bidMinor);
      if (level) bids[block.id] = level;
    }
    const draft: DraftInterview = {
      id: interview.id,
      studyId: interview.studyId,
      questionnaireVersionId: interview.questionnaireVersionId,
      routeId: interview.routeId,
      pointId: interview.pointId,
      startedAt: interview.startedAt,
      step: 0,
      answers: { ...interview.answers },
      bids,
      gps: interview.gps ?? null,
      respondentKey: interview.respondentKey ?? null,
      returnedAt,
      updatedAt: new Date().toISOString(),
    };
    await this.store.db.drafts.put(draft);
    return draft;
  }

  /** Photos held on the device for the draft, plus those of the interview it corrects. */
  private async manifestOf(draft: DraftInterview): Promise<Map<string, PhotoManifestEntry>> {
    const db = this.store.db;
    const manifest = new Map<string, PhotoManifestEntry>();
    const earlier = await db.outbox.get(draft.id);
    for (const photo of earlier?.interview.photos ?? []) manifest.set(photo.photoId, photo);
    const local = await db.photos.where('interviewId').equals(draft.id).toArray();
    for (const { id, sha256, byteSize, contentType } of local) {
      manifest.set(id, { photoId: id, sha256, byteSize, contentType });
    }
    return manifest;
  }

  private async recordBackgroundFix(id: string): Promise<void> {
    const reading = await this.gps.readOnce();
    if (!reading.ok) return;
    const { latitude, longitude, accuracyMetres } = reading.fix;
    await this.store.db.drafts.update(id, {
      gps: { latitude, longitude, accuracyM: accuracyMetres },
    });
  }
}
