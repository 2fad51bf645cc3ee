import {
  ChangeDetectionStrategy,
  Component,
  type OnInit,
  computed,
  inject,
  input,
  signal,
  viewChild,
} from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatProgressBar } from '@angular/material/progress-bar';
import { MatSelect, MatSelectModule } from '@angular/material/select';
import { RouterLink } from '@angular/router';
import type { FieldIssue } from '@shared/http/api-error';
import type { BlockKind } from '@shared/questionnaire/block-kind';
import type {
  Questionnaire,
  QuestionnaireVersion,
} from '@shared/questionnaire/questionnaire-resource';
import type { Study } from '@shared/studies/study';
import { readApiProblem } from '../../../core/api-problem';
import { QuestionnairesApi } from '../questionnaires-api';
import { StudiesApi } from '../studies-api';
import { BlockList } from './block-list';
import { BlockPalette } from './block-palette';
import { EditorState } from './editor-state';
import { serverIssueWhere } from './problem-field';
import { ProblemList } from './problem-list';
import { QuestionnairePreview } from './questionnaire-preview';
import { type HoldsUnsavedChanges, confirmDiscard } from './unsaved-changes-guard';

/**
 * The questionnaire editor: blocks to add, order and configure, every problem linked to its
 * block, and a live preview. A draft saves only when the shared rules find nothing wrong; a
 * published version is shown read-only, with a way to start the next draft from it. Leaving
 * with unsaved changes asks first: in the app through the route's guard (and the same question
 * before another version is opened), and on closing or reloading the tab through the browser's
 * own prompt.
 */
@Component({
  selector: 'app-questionnaire-editor-page',
  imports: [
    BlockList,
    BlockPalette,
    MatButton,
    MatFormFieldModule,
    MatIcon,
    MatProgressBar,
    MatSelectModule,
    ProblemList,
    QuestionnairePreview,
    RouterLink,
  ],
  providers: [EditorState],
  templateUrl: './questionnaire-editor-page.html',
  styleUrl: './questionnaire-editor-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  host: { '(window:beforeunload)': 'warnBeforeUnload($event)' },
})
export class QuestionnaireEditorPage implements OnInit, HoldsUnsavedChanges {
  private readonly studies = inject(StudiesApi);
  private readonly api = inject(QuestionnairesApi);
  private readonly dialog = inject(MatDialog);
  private readonly versionMenu = viewChild(MatSelect);
  protected readonly state = inject(EditorState);

  readonly studyId = input.required<string>();
  readonly questionnaireId = input.required<string>();

  protected readonly study = signal<Study | null>(null);
  protected readonly questionnaire = signal<Questionnaire | null>(null);
  protected readonly version = signal<QuestionnaireVersion | null>(null);
  protected readonly busy = signal(false);
  protected readonly message = signal<string | null>(null);
  protected readonly failure = signal<string | null>(null);
  protected readonly serverIssues = signal<readonly FieldIssue[]>([]);

  protected readonly money = computed(() => ({
    currency: this.study()?.currency ?? 'USD',
    locale: this.study()?.locale ?? 'en',
  }));
  protected readonly isResearcher = computed(
    () => this.study()?.myRoles.includes('researcher') ?? false,
  );
  protected readonly editable = computed(
    () => this.isResearcher() && this.version()?.status === 'draft',
  );
  protected readonly hasDraft = computed(
    () => this.questionnaire()?.versions.some((v) => v.status === 'draft') ?? false,
  );
  protected readonly blocks = computed(() => this.state.definition().blocks);

  hasUnsavedChanges(): boolean {
    return this.editable() && this.state.dirty();
  }

  ngOnInit(): void {
    this.studies.get(this.studyId()).subscribe({
      next: (study) => this.study.set(study),
      error: (error: unknown) => this.failure.set(readApiProblem(error).message),
    });
    this.loadQuestionnaire();
  }

  /** New blocks take their amounts from the study's price range, once the study is known. */
  protected addBlock(kind: BlockKind): void {
    this.state.add(kind, this.study() ?? undefined);
  }

  /** A server issue's path in the words of the problem list. */
  protected issueWhere(path: string): string {
    return serverIssueWhere(path, (index) => this.blocks()[index]?.kind);
  }

  protected warnBeforeUnload(event: BeforeUnloadEvent): void {
    if (!this.hasUnsavedChanges()) return;
    event.preventDefault();
    // Browsers that predate preventDefault() here only prompt when returnValue is set.
    event.returnValue = true;
  }

  /**
   * Opening another version replaces the blocks on screen, so unsaved edits are asked about
   * first; when the researcher stays, the menu goes back to the version still being edited.
   */
  protected chooseVersion(version: number): void {
    if (!this.hasUnsavedChanges()) {
      this.openVersion(version);
      return;
    }
    confirmDiscard(this.dialog).subscribe((discard) => {
      if (discard) this.openVersion(version);
      else this.versionMenu()?.writeValue(this.version()?.version);
    });
  }

  private openVersion(version: number): void {
    this.api.version(this.studyId(), this.questionnaireId(), version).subscribe({
      next: (loaded) => this.show(loaded),
      error: (error: unknown) => this.failure.set(readApiProblem(error).message),
    });
  }

  protected saveDraft(then?: (saved: QuestionnaireVersion) => void): void {
    if (this.busy() || this.state.problems().length > 0) return;
    this.begin();
    this.api.saveDraft(this.studyId(), this.questionnaireId(), this.state.definition()).subscribe({
      next: (saved) => {
        this.state.markSaved();
        this.version.set(saved);
        this.busy.set(false);
        if (then) then(saved);
        else this.message.set(`Draft version ${saved.version} saved.`);
      },
      error: (error: unknown) => this.fail(error),
    });
  }

  /** Saves unsaved changes first, so what is published is what is on the screen. */
  protected publish(): void {
    const publishSaved = (saved: QuestionnaireVersion) => {
      this.begin();
      this.api.publish(this.studyId(), this.questionnaireId(), saved.version).subscribe({
        next: (published) =>
          this.afterChange(
            published,
            `Version ${published.version} is published; it can no longer change.`,
          ),
        error: (error: unknown) => this.fail(error),
      });
    };
    const current = this.version();
    if (this.state.dirty()) this.saveDraft(publishSaved);
    else if (current) publishSaved(current);
  }

  protected startNewDraft(): void {
    this.begin();
    this.api.newDraft(this.studyId(), this.questionnaireId()).subscribe({
      next: (draft) =>
        this.afterChange(draft, `Draft version ${draft.version} started from the published one.`),
      error: (error: unknown) => this.fail(error),
    });
  }

  protected goToProblem(index: number): void {
    const key = this.state.selectIndex(index);
    if (key !== null) {
      requestAnimationFrame(() =>
        document
          .getElementById(`block-card-${key}`)
          ?.scrollIntoView({ behavior: 'smooth', block: 'start' }),
      );
    }
  }

  private loadQuestionnaire(then?: () => void): void {
    this.api.get(this.studyId(), this.questionnaireId()).subscribe({
      next: (questionnaire) => {
        this.questionnaire.set(questionnaire);
        const newest = questionnaire.versions[0];
        if (newest && !then) this.openVersion(newest.version);
        then?.();
      },
      error: (error: unknown) => this.failure.set(readApiProblem(error).message),
    });
  }

  private show(version: QuestionnaireVersion): void {
    this.version.set(version);
    this.state.load(version.definition);
    this.serverIssues.set([]);
  }

  private afterChange(version: QuestionnaireVersion, message: string): void {
    this.show(version);
    this.busy.set(false);
    this.message.set(message);
    this.loadQuestionnaire(() => undefined);
  }

  private begin(): void {
    this.busy.set(true);
    this.message.set(null);
    this.failure.set(null);
    this.serverIssues.set([]);
  }

  private fail(error: unknown): void {
    const problem = readApiProblem(error);
    this.busy.set(false);
    this.failure.set(problem.message);
    this.serverIssues.set(problem.issues);
  }
}
