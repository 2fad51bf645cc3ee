import { Injectable, computed, inject, signal } from '@angular/core';
import type { FieldQuestionnaireVersion, FieldStudy } from '@shared/field-sync/field-assignments';
import {
  normaliseRespondentReference,
  respondentKeyFor,
  respondentReferenceProblem,
} from '@shared/field-sync/respondent-key';
import { amountWordsFor } from '@shared/money/amount-words';
import type { BidLevel } from '@shared/questionnaire/bid-design';
import type { Block } from '@shared/questionnaire/block';
import { validateInterviewAnswers } from '@shared/questionnaire/interview-answers';
import type { RouteStop } from '@shared/routes/field-route';
import { AssignmentsCache } from '../assignments/assignments-cache';
import { routeOf, stopOf, studyOf, versionOf } from '../assignments/assignment-lookup';
import type { DraftInterview, OutboxEntry } from '../data/field-records';
import { FieldStore } from '../data/field-store';
import { TypingProblems } from '../../field-blocks/typing-problems';
import { answerIssues, screenIssues, type AnswerIssue } from './answer-check';
import { answerSchemaInCurrency } from './answer-schema-in-currency';
import { InterviewDrafts } from './interview-drafts';
import { isRefusal, nextStep, previousStep, withoutHiddenAnswers } from './interview-flow';

/** What the runner needs about the interview beyond its draft. */
export interface InterviewSetting {
  readonly version: FieldQuestionnaireVersion;
  readonly study: FieldStudy | null;
  readonly stop: RouteStop | null;
  /** The outbox entry this draft corrects (returned or refused), with the reason. */
  readonly correcting: OutboxEntry | null;
}

/**
 * The interview on screen: its draft, the block shown, the answer being given, and the moves
 * between blocks. Each move is written to the device database before the screen changes.
 */
@Injectable()
export class InterviewSession {
  private readonly drafts = inject(InterviewDrafts);
  private readonly assignments = inject(AssignmentsCache);
  private readonly store = inject(FieldStore);
  private readonly typing = inject(TypingProblems);

  readonly draft = signal<DraftInterview | null>(null);
  readonly setting = signal<InterviewSetting | null>(null);
  readonly loadProblem = signal<string | null>(null);
  readonly pending = signal<unknown>(undefined);
  readonly issues = signal<readonly AnswerIssue[]>([]);
  readonly bids = signal<Record<string, BidLevel>>({});
  readonly busy = signal(false);
  /** What is wrong with the respondent reference being typed, if anything. */
  readonly referenceProblem = signal<string | null>(null);
  /** Respondent-key writes, chained so the last keystroke's key is the one that stays. */
  private keyWrites: Promise<void> = Promise.resolve();

  readonly blocks = computed(() => this.setting()?.version.definition.blocks ?? []);
  readonly step = computed(() => this.draft()?.step ?? 0);
  readonly answers = computed(() => this.draft()?.answers ?? {});
  readonly block = computed(() => this.blocks()[this.step()] ?? null);
  readonly atEnd = computed(() => this.setting() !== null && this.block() === null);
  readonly hasRespondentKey = computed(() => Boolean(this.draft()?.respondentKey));
  /** Amounts in messages, written as the runner writes them elsewhere. */
  private readonly amountWords = computed(() => {
    const study = this.setting()?.study;
    return amountWordsFor(study?.currency ?? 'USD', study?.locale ?? 'en');
  });

  async load(id: string): Promise<void> {
    const draft = await this.drafts.get(id);
    const cached = await this.assignments.read();
    const version =
      cached && draft ? versionOf(cached.payload, draft.questionnaireVersionId) : null;
    if (!draft || !cached || !version) {
      this.loadProblem.set(
        draft
          ? 'The questionnaire of this interview is no longer on the device. Update your routes.'
          : 'This interview is not on the device: it was finished, discarded or never started here.',
      );
      return;
    }
    const route = routeOf(cached.payload, draft.routeId)?.route;
    this.setting.set({
      version,
      study: studyOf(cached.payload, draft.studyId),
      stop: route ? stopOf(route, draft.pointId) : null,
      correcting: (await this.store.db.outbox.get(id)) ?? null,
    });
    this.draft.set(draft);
    this.bids.set(draft.bids);
    await this.enterStep(draft.step);
  }

  /**
   * The answer given on screen, saved as it is typed so a closed tab loses nothing. Problems
   * already shown are checked again, so each goes as soon as it is put right.
   */
  async change(answer: unknown): Promise<void> {
    const draft = this.draft();
    const block = this.block();
    this.pending.set(answer);
    this.issues.set(block && this.issues().length > 0 ? this.issuesOf(block, answer) : []);
    if (draft && block) await this.drafts.saveAnswer(draft.id, block.id, answer, draft.step);
  }

  /**
   * Keeps the one-way code of the respondent reference typed, in place of any before; an empty
   * or unusable reference removes it, so the draft never holds a key of something half typed.
   * The typed text stays in the input alone: it is hashed here and dropped.
   */
  noteRespondentReference(typed: string): Promise<void> {
    const draft = this.draft();
    if (!draft) return Promise.resolve();
    const problem = respondentReferenceProblem(typed);
    this.referenceProblem.set(problem);
    this.issues.set([]);
    const usable = problem === null && normaliseRespondentReference(typed).length > 0;
    const write = this.keyWrites.then(async () => {
      const key = usable ? await respondentKeyFor(draft.studyId, typed) : null;
      await this.drafts.saveRespondentKey(draft.id, key);
      this.draft.update((held) => (held?.id === draft.id ? { ...held, respondentKey: key } : held));
    });
    this.keyWrites = write.catch(() =>
      this.referenceProblem.set('Respondent reference: it could not be kept on this device'),
    );
    return this.keyWrites;
  }

  /** Checks the answer and moves to the next block asked; 'refused' when consent was declined. */
  async next(): Promise<'moved' | 'invalid' | 'refused'> {
    await this.keyWrites;
    const draft = this.draft();
    const block = this.block();
    if (!draft || !block) return 'invalid';
    const answer = this.pending();
    const issues = this.issuesOf(block, answer);
    if (issues.length === 0 && isRefusal(block, answer)) {
      await this.drafts.refuse(draft.id);
      return 'refused';
    }
    const referenceProblem = this.referenceProblem();
    if (referenceProblem) issues.push({ path: 'respondentReference', message: referenceProblem });
    if (issues.length > 0) {
      this.issues.set(issues);
      return 'invalid';
    }
    const answers = { ...draft.answers, [block.id]: answer };
    if (answer === undefined) delete answers[block.id];
    const asked = withoutHiddenAnswers(this.blocks(), answers);
    await this.moveTo(nextStep(this.blocks(), asked, draft.step), block.id, answer);
    return 'moved';
  }

  private issuesOf(block: Block, answer: unknown): AnswerIssue[] {
    const issues = answerIssues(block, answer, this.amountWords());
    return screenIssues(issues, this.typing.byPart());
  }

  async back(): Promise<void> {
    const draft = this.draft();
    if (!draft) return;
    const asked = withoutHiddenAnswers(this.blocks(), draft.answers);
    const target = previousStep(this.blocks(), asked, draft.step);
    if (target === null) return;
    const block = this.block();
    await this.moveTo(target, block?.id ?? null, this.pending());
  }

  /** Problems left with the whole interview; empty when it can be finished. */
  finalProblems(): { blockIndex: number | null; message: string; prompt: string }[] {
    const setting = this.setting();
    if (!setting) return [];
    const blocks = this.blocks();
    const answers = withoutHiddenAnswers(blocks, this.answers());
    const words = this.amountWords();
    const schemaFor = (block: Block) => answerSchemaInCurrency(block, words);
    return validateInterviewAnswers(setting.version.definition, answers, schemaFor).map(
      (problem) => ({
        blockIndex: problem.blockIndex,
        message: problem.message,
        prompt: problem.blockIndex === null ? '' : blocks[problem.blockIndex].prompt,
      }),
    );
  }

  async finish(): Promise<OutboxEntry> {
    await this.keyWrites;
    const draft = this.draft();
    const setting = this.setting();
    if (!draft || !setting) throw new Error('No interview is open');
    return this.drafts.finish(draft.id, setting.version);
  }

  async discard(): Promise<void> {
    const draft = this.draft();
    if (draft) await this.drafts.discard(draft.id);
  }

  async goTo(step: number): Promise<void> {
    await this.moveTo(step, null, undefined);
  }

  private async moveTo(step: number, blockId: string | null, answer: unknown): Promise<void> {
    const draft = this.draft();
    if (!draft) return;
    this.busy.set(true);
    try {
      if (blockId) await this.drafts.saveAnswer(draft.id, blockId, answer, step);
      else await this.store.db.drafts.update(draft.id, { step });
      const saved = await this.drafts.get(draft.id);
      if (saved) this.draft.set(saved);
      await this.enterStep(step);
    } finally {
      this.busy.set(false);
    }
  }

  /** Shows the stored answer of the block at `step`, drawing its bid first if it needs one. */
  private async enterStep(step: number): Promise<void> {
    const draft = this.draft();
    const block = this.blocks()[step];
    this.issues.set([]);
    // The reference input belongs to the consent screen; leaving it leaves its problem behind.
    this.referenceProblem.set(null);
    this.pending.set(block && draft ? draft.answers[block.id] : undefined);
    if (draft && block?.kind === 'dichotomous-choice' && !this.bids()[block.id]) {
      const bid = await this.drafts.bidFor(draft.id, block);
      this.bids.update((held) => ({ ...held, [block.id]: bid }));
    }
  }
}
