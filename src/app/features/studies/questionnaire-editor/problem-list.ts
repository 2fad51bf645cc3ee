import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import { MatIcon } from '@angular/material/icon';
import type { Block } from '@shared/questionnaire/block';
import { blockKindLabels } from '@shared/questionnaire/block-kind';
import type { QuestionnaireProblem } from '@shared/questionnaire/questionnaire-problem';
import { problemFieldLabel } from './problem-field';

/** Every problem in the questionnaire, each linked to the block it belongs to. */
@Component({
  selector: 'app-problem-list',
  imports: [MatIcon],
  template: `
    <section class="problems" aria-labelledby="problems-heading">
      <h2 id="problems-heading" class="problems__heading">
        <mat-icon aria-hidden="true">error</mat-icon>
        {{ problems().length }} {{ problems().length === 1 ? 'problem' : 'problems' }} to fix before
        saving
      </h2>
      <ul class="problems__list">
        @for (row of rows(); track $index) {
          <li>
            @if (row.blockIndex !== null) {
              <button type="button" class="problems__link" (click)="goTo.emit(row.blockIndex)">
                {{ row.where }}
              </button>
            } @else {
              <span class="problems__where">Questionnaire</span>
            }
            <span>{{ row.message }}</span>
          </li>
        }
      </ul>
    </section>
  `,
  styles: `
    .problems {
      padding: 12px 16px;
      border-radius: 12px;
      background: var(--mat-sys-error-container);
      color: var(--mat-sys-on-error-container);
    }
    .problems__heading {
      display: flex;
      align-items: center;
      gap: 8px;
      font: var(--mat-sys-title-small);
      margin: 0 0 8px;
    }
    .problems__list {
      margin: 0;
      padding: 0 0 0 20px;
      display: grid;
      gap: 6px;
    }
    .problems__link {
      display: block;
      padding: 4px 0;
      min-height: 32px;
      border: 0;
      background: none;
      color: inherit;
      font: var(--mat-sys-label-large);
      text-decoration: underline;
      cursor: pointer;
      text-align: left;
    }
    .problems__where {
      display: block;
      font: var(--mat-sys-label-large);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ProblemList {
  readonly problems = input.required<readonly QuestionnaireProblem[]>();
  readonly blocks = input.required<readonly Block[]>();
  readonly goTo = output<number>();

  /** "Block 2 · Price ladder “ladder” · Price 3": where to look, in the editor's own words. */
  protected readonly rows = computed(() =>
    this.problems().map((problem) => {
      if (problem.blockIndex === null) return { ...problem, where: 'Questionnaire' };
      const block = this.blocks()[problem.blockIndex];
      const parts = [`Block ${problem.blockIndex + 1}`];
      const kind = block ? blockKindLabels[block.kind] : undefined;
      if (kind) parts.push(problem.blockId ? `${kind} “${problem.blockId}”` : kind);
      const field = problemFieldLabel(problem.path, block?.kind);
      if (field) parts.push(field);
      return { ...problem, where: parts.join(' · ') };
    }),
  );
}
