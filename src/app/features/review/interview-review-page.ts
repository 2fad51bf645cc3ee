import { DatePipe } from '@angular/common';
import {
  ChangeDetectionStrategy,
  Component,
  computed,
  effect,
  inject,
  input,
  signal,
} from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatIcon } from '@angular/material/icon';
import { toSignal } from '@angular/core/rxjs-interop';
import { ActivatedRoute, RouterLink } from '@angular/router';
import { map } from 'rxjs';
import type { InterviewDetail } from '@shared/field-sync/interview-detail';
import { reviewActionSchema, type ReviewAction } from '@shared/field-sync/review-action';
import type { Study } from '@shared/studies/study';
import { readApiProblem } from '../../core/api-problem';
import { describeAnswer } from './answer-summary';
import { FlagDetail } from './flag-detail';
import { PositionPlot } from './position-plot';
import { filterFromParams, filterToParams } from './queue-filter';
import { neighbourWindowOffset, queueNeighbours, type QueueNeighbours } from './queue-neighbours';
import { ReviewApi } from './review-api';
import { formatDuration, statusLabels } from './review-words';

const actionWords: Record<ReviewAction, string> = {
  accept: 'Accepted.',
  return: 'Returned to the enumerator with your note.',
  reject: 'Rejected.',
};

/** One interview under review: answers per block, flags, positions, photos, and the decision. */
@Component({
  selector: 'app-interview-review-page',
  imports: [DatePipe, FlagDetail, MatButton, MatCardModule, MatIcon, PositionPlot, RouterLink],
  templateUrl: './interview-review-page.html',
  styleUrl: './interview-review-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class InterviewReviewPage {
  private readonly api = inject(ReviewApi);
  private readonly params = toSignal(
    inject(ActivatedRoute).queryParamMap.pipe(
      map((paramMap) =>
        Object.fromEntries(paramMap.keys.map((key) => [key, paramMap.get(key) ?? undefined])),
      ),
    ),
    { initialValue: {} as Record<string, string | undefined> },
  );
  /** The queue's filter the interview was opened under, carried in the address. */
  protected readonly filterParams = computed(() => filterToParams(filterFromParams(this.params())));
  private readonly at = computed(() => {
    const at = Number(this.params()['at']);
    return Number.isInteger(at) && at >= 0 ? at : null;
  });
  protected readonly neighbours = signal<QueueNeighbours>({ previous: null, next: null });

  readonly studyId = input.required<string>();
  readonly interviewId = input.required<string>();
  protected readonly detail = signal<InterviewDetail | null>(null);
  protected readonly study = signal<Study | null>(null);
  protected readonly problem = signal<string | null>(null);
  protected readonly note = signal('');
  protected readonly noteProblem = signal<string | null>(null);
  protected readonly done = signal<string | null>(null);
  protected readonly sending = signal(false);
  protected readonly statusLabels = statusLabels;
  protected readonly formatDuration = formatDuration;

  protected readonly answers = computed(() => {
    const detail = this.detail();
    const study = this.study();
    if (!detail) return [];
    return detail.definition.blocks.map((block) => ({
      id: block.id,
      prompt: block.prompt,
      text: describeAnswer(
        block,
        detail.answers[block.id],
        study?.currency ?? 'USD',
        study?.locale ?? 'en',
      ),
    }));
  });
  protected readonly canDecide = computed(() => {
    const status = this.detail()?.status;
    return status === 'received' || status === 'flagged';
  });

  constructor() {
    effect(() => {
      const [studyId, interviewId] = [this.studyId(), this.interviewId()];
      // A flag links to another interview on this same page: start its decision afresh.
      this.done.set(null);
      this.note.set('');
      this.noteProblem.set(null);
      this.problem.set(null);
      this.api
        .study(studyId)
        .subscribe({ next: (study) => this.study.set(study), error: () => undefined });
      this.api.interview(studyId, interviewId).subscribe({
        next: (detail) => this.detail.set(detail),
        error: (error: unknown) => this.problem.set(readApiProblem(error).message),
      });
    });
    effect(() => this.loadNeighbours(this.studyId(), this.interviewId(), this.at()));
  }

  /** The address of a neighbour in the list, under the same filter. */
  protected neighbourParams(at: number): Record<string, string> {
    return { ...this.filterParams(), at: String(at) };
  }

  private loadNeighbours(studyId: string, interviewId: string, at: number | null): void {
    this.neighbours.set({ previous: null, next: null });
    if (at === null) return;
    const filter = filterFromParams(this.params());
    this.api.queue(studyId, filter, neighbourWindowOffset(at), 3).subscribe({
      next: (window) => this.neighbours.set(queueNeighbours(window.items, at, interviewId)),
      error: () => undefined, // without neighbours the page still works; the queue link remains
    });
  }

  protected decide(action: ReviewAction): void {
    const parsed = reviewActionSchema.safeParse({ action, note: this.note().trim() || undefined });
    if (!parsed.success) {
      this.noteProblem.set(parsed.error.issues[0]?.message ?? 'Write a note');
      return;
    }
    this.noteProblem.set(null);
    this.sending.set(true);
    this.api.review(this.studyId(), this.interviewId(), parsed.data).subscribe({
      next: (detail) => {
        this.detail.set(detail);
        this.done.set(actionWords[action]);
        this.loadNeighbours(this.studyId(), this.interviewId(), this.at());
        this.sending.set(false);
      },
      error: (error: unknown) => {
        this.problem.set(readApiProblem(error).message);
        this.sending.set(false);
      },
    });
  }
}
