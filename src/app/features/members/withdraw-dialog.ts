import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import type { Invitation } from '@shared/members/invitation';
import { readApiProblem } from '../../core/api-problem';
import { MembersApi } from './members-api';

export interface WithdrawDialogData {
  readonly invitation: Invitation;
}

/**
 * Asks before withdrawing an invitation, since the e-mail cannot be recalled, only its link
 * stopped; closes with `true` once the server has withdrawn it.
 */
@Component({
  selector: 'app-withdraw-dialog',
  imports: [MatButton, MatDialogModule],
  template: `
    <h2 mat-dialog-title>Withdraw this invitation?</h2>
    <mat-dialog-content>
      <p>
        {{ invitation.name }} ({{ invitation.email }}) will no longer be able to join with the link
        in their e-mail. You can invite them again afterwards.
      </p>
      @if (problem(); as message) {
        <p class="withdraw-dialog__error" role="alert">{{ message }}</p>
      }
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" mat-dialog-close>Keep it</button>
      <button mat-flat-button type="button" [disabled]="working()" (click)="withdrawInvitation()">
        Withdraw invitation
      </button>
    </mat-dialog-actions>
  `,
  styles: `
    .withdraw-dialog__error {
      margin: 8px 0 0;
      color: var(--mat-sys-error);
    }
    mat-dialog-actions button {
      min-height: 48px;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class WithdrawDialog {
  private readonly api = inject(MembersApi);
  private readonly dialogRef = inject<MatDialogRef<WithdrawDialog, boolean>>(MatDialogRef);
  protected readonly invitation = inject<WithdrawDialogData>(MAT_DIALOG_DATA).invitation;

  protected readonly working = signal(false);
  protected readonly problem = signal<string | null>(null);

  protected withdrawInvitation(): void {
    if (this.working()) return;
    this.working.set(true);
    this.problem.set(null);
    this.api.withdrawInvitation(this.invitation.id).subscribe({
      next: () => this.dialogRef.close(true),
      error: (error: unknown) => {
        this.working.set(false);
        this.problem.set(readApiProblem(error).message);
      },
    });
  }
}
