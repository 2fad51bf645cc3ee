import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatButton } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatIcon } from '@angular/material/icon';
import { Router, RouterLink } from '@angular/router';
import { AssignmentsCache } from '../assignments/assignments-cache';
import { versionOf } from '../assignments/assignment-lookup';
import type { OutboxEntry } from '../data/field-records';
import { FieldStore } from '../data/field-store';
import { InterviewDrafts } from '../interview/interview-drafts';
import { OutboxSync } from './outbox-sync';
import { SyncOverviewSource } from './sync-overview';
import { syncPhaseWords } from './sync-phase-words';

/** The sync page: what waits, when the last sync worked, and what came back to correct. */
@Component({
  selector: 'app-sync-page',
  imports: [DatePipe, MatButton, MatCardModule, MatIcon, RouterLink],
  templateUrl: './sync-page.html',
  styleUrls: ['../field-page.scss', './sync-page.scss'],
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SyncPage {
  private readonly store = inject(FieldStore);
  private readonly drafts = inject(InterviewDrafts);
  private readonly router = inject(Router);
  private readonly cache = inject(AssignmentsCache);
  protected readonly sync = inject(OutboxSync);
  protected readonly overview = toSignal(inject(SyncOverviewSource).watch());
  private readonly assignments = toSignal(this.cache.watch());
  protected readonly phaseWords = syncPhaseWords;
  protected readonly openProblem = signal<string | null>(null);

  /** Interviews refused by the server (correctable) apart from those a supervisor rejected. */
  protected readonly refused = computed(() =>
    (this.overview()?.rejected ?? []).filter((entry) => entry.serverStatus !== 'rejected'),
  );
  protected readonly rejectedByReview = computed(() =>
    (this.overview()?.rejected ?? []).filter((entry) => entry.serverStatus === 'rejected'),
  );

  constructor() {
    this.sync.start();
  }

  protected pointName(entry: OutboxEntry): string {
    const routes = this.assignments()?.payload.routes ?? [];
    const stop = routes.flatMap((r) => r.stops).find((s) => s.pointId === entry.pointId);
    return stop?.name ?? 'a point no longer assigned';
  }

  protected isBeingCorrected(entry: OutboxEntry): boolean {
    return this.overview()?.correcting.includes(entry.id) ?? false;
  }

  /** Opens the interview in the runner with its answers, to correct and send again. */
  protected async correct(entry: OutboxEntry): Promise<void> {
    this.openProblem.set(null);
    if (!this.isBeingCorrected(entry)) {
      const payload = this.assignments()?.payload;
      const version = payload ? versionOf(payload, entry.interview.questionnaireVersionId) : null;
      if (!version) {
        this.openProblem.set('Its questionnaire is not on this device. Update your routes first.');
        return;
      }
      const notice = await this.store.db.notices.get(entry.id);
      const returnedAt = entry.state === 'returned' ? (notice?.reviewedAt ?? null) : null;
      await this.drafts.reopen(entry, version, returnedAt);
    }
    await this.router.navigate(['/field/interviews', entry.id]);
  }

  protected async discardRefused(entry: OutboxEntry): Promise<void> {
    await this.store.db.transaction('rw', this.store.db.outbox, this.store.db.photos, async () => {
      await this.store.db.outbox.delete(entry.id);
      await this.store.db.photos.where('interviewId').equals(entry.id).delete();
    });
  }
}
