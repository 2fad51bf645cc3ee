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
import { toSignal } from '@angular/core/rxjs-interop';
import { MatButton } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatCheckbox } from '@angular/material/checkbox';
import { MatDialog } from '@angular/material/dialog';
import { MatIcon } from '@angular/material/icon';
import { MatPaginator, type PageEvent } from '@angular/material/paginator';
import { MatProgressBar } from '@angular/material/progress-bar';
import { ActivatedRoute, Router, RouterLink } from '@angular/router';
import { map } from 'rxjs';
import { qualityFlagKinds, qualityFlagLabels } from '@shared/field-sync/quality/quality-flag';
import {
  interviewReferenceSchema,
  type BulkAcceptResult,
  type ReviewFacets,
  type ReviewQueue,
  type ReviewQueueItem,
} from '@shared/field-sync/review-queue';
import { interviewStatuses } from '@shared/interviews/interview-status';
import { readApiProblem } from '../../core/api-problem';
import { AcceptSeveralDialog, type AcceptSeveralData } from './accept-several-dialog';
import { FlagDetail } from './flag-detail';
import {
  filterFromParams,
  filterToParams,
  pageFromParams,
  queuePageSize,
  type QueueFilter,
} from './queue-filter';
import { ReviewApi } from './review-api';
import { formatDuration, interviewReference, statusLabels } from './review-words';

const decidable = (item: ReviewQueueItem) =>
  item.status === 'received' || item.status === 'flagged';

/**
 * A study's interviews to review, page by page: filters and page live in the address, so a
 * reload, the back button or a shared link shows the same list. Supervisors can tick several
 * and accept them with one confirmation.
 */
@Component({
  selector: 'app-review-queue-page',
  imports: [
    DatePipe,
    FlagDetail,
    MatButton,
    MatCardModule,
    MatCheckbox,
    MatIcon,
    MatPaginator,
    MatProgressBar,
    RouterLink,
  ],
  templateUrl: './review-queue-page.html',
  styleUrl: './review-queue-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReviewQueuePage {
  private readonly api = inject(ReviewApi);
  private readonly router = inject(Router);
  private readonly dialog = inject(MatDialog);
  private readonly params = toSignal(
    inject(ActivatedRoute).queryParamMap.pipe(
      map((paramMap) =>
        Object.fromEntries(paramMap.keys.map((key) => [key, paramMap.get(key) ?? undefined])),
      ),
    ),
    { initialValue: {} as Record<string, string | undefined> },
  );

  readonly studyId = input.required<string>();
  protected readonly statuses = interviewStatuses;
  protected readonly statusLabels = statusLabels;
  protected readonly flagKinds = qualityFlagKinds;
  protected readonly flagLabels = qualityFlagLabels;
  protected readonly formatDuration = formatDuration;
  protected readonly interviewReference = interviewReference;
  protected readonly pageSize = queuePageSize;

  protected readonly filter = computed(() => filterFromParams(this.params()));
  protected readonly page = computed(() => pageFromParams(this.params()));
  protected readonly filtered = computed(
    () => Object.keys(filterToParams(this.filter())).length > 0,
  );
  protected readonly queue = signal<ReviewQueue | null>(null);
  protected readonly facets = signal<ReviewFacets | null>(null);
  protected readonly canDecide = signal(false);
  protected readonly loading = signal(false);
  protected readonly problem = signal<string | null>(null);
  protected readonly notice = signal<string | null>(null);
  protected readonly referenceProblem = signal<string | null>(null);
  protected readonly selected = signal<ReadonlySet<string>>(new Set());

  protected readonly selectable = computed(() => this.queue()?.items.filter(decidable) ?? []);
  protected readonly selectedCount = computed(() => this.selected().size);

  constructor() {
    effect(() => this.load(this.studyId(), this.filter(), this.page()));
    effect(() => {
      const studyId = this.studyId();
      this.api
        .facets(studyId)
        .subscribe({ next: (f) => this.facets.set(f), error: () => undefined });
      this.api.study(studyId).subscribe({
        next: (study) => this.canDecide.set(study.myRoles.includes('supervisor')),
        error: () => undefined,
      });
    });
  }

  /** Changes one filter field and goes back to the first page. */
  protected setFilter<K extends keyof QueueFilter>(key: K, value: string): void {
    const next = { ...this.filter(), [key]: value === '' ? undefined : value };
    this.navigate(next, 1);
  }

  /** Searches by a quoted reference, or says why the text cannot be one. */
  protected searchReference(text: string): void {
    const value = text.trim();
    const parsed = interviewReferenceSchema.safeParse(value);
    if (value !== '' && !parsed.success) {
      this.referenceProblem.set(parsed.error.issues[0]?.message ?? 'Not a reference');
      return;
    }
    this.referenceProblem.set(null);
    this.setFilter('reference', value);
  }

  protected clearFilters(): void {
    this.referenceProblem.set(null);
    this.navigate({}, 1);
  }

  protected changePage(event: PageEvent): void {
    this.navigate(this.filter(), event.pageIndex + 1);
  }

  /** The address of an interview opened from this list, carrying its place in the list. */
  protected detailParams(index: number): Record<string, string> {
    const at = (this.page() - 1) * queuePageSize + index;
    return { ...filterToParams(this.filter()), at: String(at) };
  }

  protected toggle(id: string, on: boolean): void {
    this.selected.update((current) => {
      const next = new Set(current);
      if (on) next.add(id);
      else next.delete(id);
      return next;
    });
  }

  protected selectUnflagged(): void {
    this.selected.set(
      new Set(
        this.selectable()
          .filter((item) => item.flags.length === 0)
          .map((item) => item.id),
      ),
    );
  }

  protected clearSelection(): void {
    this.selected.set(new Set());
  }

  protected acceptSelected(): void {
    const ids = [...this.selected()];
    const items = this.queue()?.items ?? [];
    const data: AcceptSeveralData = {
      studyId: this.studyId(),
      interviewIds: ids,
      flaggedCount: items.filter((item) => ids.includes(item.id) && item.flags.length > 0).length,
    };
    this.dialog
      .open<AcceptSeveralDialog, AcceptSeveralData, BulkAcceptResult>(AcceptSeveralDialog, {
        data,
        autoFocus: 'dialog',
      })
      .afterClosed()
      .subscribe((result) => {
        if (!result) return;
        this.notice.set(
          `Accepted ${result.accepted} interview${result.accepted === 1 ? '' : 's'}` +
            (result.alreadyAccepted > 0 ? ` (${result.alreadyAccepted} already were).` : '.'),
        );
        this.selected.set(new Set());
        this.load(this.studyId(), this.filter(), this.page());
      });
  }

  private navigate(filter: QueueFilter, page: number): void {
    const queryParams = { ...filterToParams(filter), ...(page > 1 ? { page: String(page) } : {}) };
    void this.router.navigate(['/review', this.studyId()], { queryParams });
  }

  private load(studyId: string, filter: QueueFilter, page: number): void {
    this.loading.set(true);
    this.selected.set(new Set());
    this.api.queue(studyId, filter, (page - 1) * queuePageSize).subscribe({
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
