import {
  ChangeDetectionStrategy,
  Component,
  ElementRef,
  computed,
  effect,
  inject,
  input,
  signal,
  viewChild,
} from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { MatProgressBar } from '@angular/material/progress-bar';
import { MatSnackBar } from '@angular/material/snack-bar';
import { Router } from '@angular/router';
import type { FieldIssue } from '@shared/http/api-error';
import { BLOCK_PHOTO_STORE, type BlockViewContext } from '../../field-blocks/block-view-context';
import { BlockView } from '../../field-blocks/block-view';
import { TypingProblems } from '../../field-blocks/typing-problems';
import { OutboxSync } from '../sync/outbox-sync';
import { correctionIssueText } from './correction-issue';
import { progressPercent, withoutHiddenAnswers } from './interview-flow';
import { InterviewPhotoStore } from './interview-photo-store';
import { InterviewSession } from './interview-session';
import { RespondentReference } from './respondent-reference';

/** The interview runner: one block per screen, consent first, back and forward. */
@Component({
  selector: 'app-interview-runner-page',
  imports: [BlockView, MatButton, MatIcon, MatProgressBar, RespondentReference],
  templateUrl: './interview-runner-page.html',
  styleUrls: ['../field-page.scss', './interview-runner-page.scss'],
  providers: [
    InterviewSession,
    InterviewPhotoStore,
    TypingProblems,
    { provide: BLOCK_PHOTO_STORE, useExisting: InterviewPhotoStore },
  ],
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class InterviewRunnerPage {
  private readonly router = inject(Router);
  private readonly snackBar = inject(MatSnackBar);
  private readonly sync = inject(OutboxSync);
  private readonly photos = inject(InterviewPhotoStore);
  protected readonly session = inject(InterviewSession);

  readonly interviewId = input.required<string>();
  private readonly focusTarget = viewChild<ElementRef<HTMLElement>>('screenTop');

  protected readonly confirmingStop = signal(false);
  protected readonly finalProblems = signal<ReturnType<InterviewSession['finalProblems']>>([]);
  protected readonly progress = computed(() =>
    progressPercent(
      this.session.blocks(),
      withoutHiddenAnswers(this.session.blocks(), this.session.answers()),
      this.session.step(),
    ),
  );
  protected readonly context = computed<BlockViewContext>(() => {
    const study = this.session.setting()?.study;
    const block = this.session.block();
    return {
      currency: study?.currency ?? 'USD',
      locale: study?.locale ?? 'en',
      bid: block ? (this.session.bids()[block.id] ?? null) : null,
      seed: this.interviewId(),
    };
  });

  constructor() {
    effect(() => {
      const id = this.interviewId();
      this.photos.interviewId = id;
      void this.session.load(id);
    });
  }

  protected correctionText(issue: FieldIssue): string {
    return correctionIssueText(issue, this.session.blocks());
  }

  protected async goForward(): Promise<void> {
    const outcome = await this.session.next();
    if (outcome === 'refused') {
      this.snackBar.open('Interview ended without consent. Only the refusal is counted.', 'Close', {
        duration: 6000,
      });
      await this.leave();
    } else if (outcome === 'moved') {
      this.finalProblems.set(this.session.atEnd() ? this.session.finalProblems() : []);
      this.focusScreen();
    } else {
      this.focusScreen('.runner__issues');
    }
  }

  protected async goBack(): Promise<void> {
    await this.session.back();
    this.focusScreen();
  }

  protected async goToBlock(index: number | null): Promise<void> {
    if (index === null) return;
    await this.session.goTo(index);
    this.focusScreen();
  }

  protected async finishInterview(): Promise<void> {
    const problems = this.session.finalProblems();
    this.finalProblems.set(problems);
    if (problems.length > 0) return this.focusScreen('.runner__issues');
    await this.session.finish();
    this.snackBar.open('Interview saved on this device. It goes out with the next sync.', 'Close', {
      duration: 6000,
    });
    this.sync.syncNow();
    await this.leave();
  }

  protected async stopInterview(): Promise<void> {
    await this.session.discard();
    await this.leave();
  }

  private async leave(): Promise<void> {
    const routeId = this.session.draft()?.routeId;
    await this.router.navigate(routeId ? ['/field/routes', routeId] : ['/field/routes']);
  }

  /** Moves keyboard and screen-reader focus to the new screen (or its problems). */
  private focusScreen(selector?: string): void {
    setTimeout(() => {
      const top = this.focusTarget()?.nativeElement;
      const target = selector ? top?.parentElement?.querySelector<HTMLElement>(selector) : top;
      target?.focus();
      target?.scrollIntoView({ block: 'start' });
    });
  }
}
