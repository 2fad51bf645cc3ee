import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import type { BulkAcceptResult } from '@shared/field-sync/review-queue';
import { readApiProblem } from '../../core/api-problem';
import { ReviewApi } from './review-api';

export interface AcceptSeveralData {
  readonly studyId: string;
  readonly interviewIds: readonly string[];
  readonly flaggedCount: number;
}

/**
 * One confirmation for several acceptances: says how many, and how many of them a check had
 * flagged, since accepting those overrules the check. Closes with what the server did.
 */
@Component({
  selector: 'app-accept-several-dialog',
  imports: [MatButton, MatDialogModule],
  template: `
    <h2 mat-dialog-title>Accept {{ count }} interview{{ count === 1 ? '' : 's' }}?</h2>
    <mat-dialog-content>
      <p>
        They count toward the study’s quotas and enter the analysis. You can still return or reject
        any of them later, one by one.
      </p>
      @if (data.flaggedCount > 0) {
        <p class="accept-several__flagged">
          {{ data.flaggedCount }} of them {{ data.flaggedCount === 1 ? 'was' : 'were' }} flagged by
          a quality check: accepting overrules the check.
        </p>
      }
      @if (problem(); as message) {
        <p class="accept-several__error" role="alert">{{ message }}</p>
      }
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" mat-dialog-close>Keep reviewing</button>
      <button mat-flat-button type="button" [disabled]="working()" (click)="accept()">
        Accept {{ count }}
      </button>
    </mat-dialog-actions>
  `,
  styles: `
    .accept-several__flagged {
      font-weight: 500;
    }
    .accept-several__error {
      margin: 8px 0 0;
      color: var(--mat-sys-error);
    }
    mat-dialog-actions button {
      min-height: 48px;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AcceptSeveralDialog {
  private readonly api = inject(ReviewApi);
  private readonly dialogRef =
    inject<MatDialogRef<AcceptSeveralDialog, BulkAcceptResult>>(MatDialogRef);
  protected readonly data = inject<AcceptSeveralData>(MAT_DIALOG_DATA);
  protected readonly count = this.data.interviewIds.length;
  protected readonly working = signal(false);
  protected readonly problem = signal<string | null>(null);

  protected accept(): void {
    if (this.working()) return;
    this.working.set(true);
    this.problem.set(null);
    this.api.acceptSeveral(this.data.studyId, [...this.data.interviewIds]).subscribe({
      next: (result) => this.dialogRef.close(result),
      error: (error: unknown) => {
        this.problem.set(readApiProblem(error).message);
        this.working.set(false);
      },
    });
  }
}
