import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, effect, inject, input, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatIcon } from '@angular/material/icon';
import { MatProgressBar } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import type { ReviewQueue } from '@shared/field-sync/review-queue';
import { interviewStatuses, type InterviewStatus } from '@shared/interviews/interview-status';
import { readApiProblem } from '../../core/api-problem';
import { ReviewApi } from './review-api';
import { FlagDetail } from './flag-detail';
import { formatDuration, statusLabels } from './review-words';

/** A study's interviews to review: flagged first, with what each flag found. */
@Component({
  selector: 'app-review-queue-page',
  imports: [DatePipe, FlagDetail, MatButton, MatCardModule, MatIcon, MatProgressBar, RouterLink],
  templateUrl: './review-queue-page.html',
  styleUrl: './review-queue-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReviewQueuePage {
  private readonly api = inject(ReviewApi);

  readonly studyId = input.required<string>();
  protected readonly statuses = interviewStatuses;
  protected readonly statusLabels = statusLabels;
  protected readonly formatDuration = formatDuration;
  protected readonly status = signal<InterviewStatus | null>(null);
  protected readonly queue = signal<ReviewQueue | null>(null);
  protected readonly loading = signal(false);
  protected readonly problem = signal<string | null>(null);

  constructor() {
    effect(() => this.load(this.studyId(), this.status()));
  }

  protected chooseStatus(value: string): void {
    this.status.set(value === '' ? null : (value as InterviewStatus));
  }

  private load(studyId: string, status: InterviewStatus | null): void {
    this.loading.set(true);
    this.api.queue(studyId, status).subscribe({
      next: (queue) => {
        this.queue.set(queue);
        this.problem.set(null);
        this.loading.set(false);
      },
      error: (error: unknown) => {
        this.problem.set(readApiProblem(error).message);
        this.loading.set(false);
      },
    });
  }
}
