import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import type { StudyStatus } from '@shared/studies/study-status';
import { studyStatusLabels } from '@shared/studies/study-status-change';

/** A study's status as a small coloured label. */
@Component({
  selector: 'app-study-status-chip',
  template: `<span class="status" [class]="'status status--' + status()">{{
    labels[status()]
  }}</span>`,
  styles: `
    .status {
      display: inline-block;
      padding: 2px 10px;
      border-radius: 999px;
      font: var(--mat-sys-label-large);
      background: var(--mat-sys-surface-container-highest);
      color: var(--mat-sys-on-surface);
    }
    .status--in_field {
      background: var(--mat-sys-primary-container);
      color: var(--mat-sys-on-primary-container);
    }
    .status--closed {
      background: var(--mat-sys-secondary-container);
      color: var(--mat-sys-on-secondary-container);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StudyStatusChip {
  readonly status = input.required<StudyStatus>();
  protected readonly labels = studyStatusLabels;
}
