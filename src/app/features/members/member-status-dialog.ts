import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import type { Member } from '@shared/members/member';
import { readApiProblem } from '../../core/api-problem';
import { MembersApi } from './members-api';
import { statusChangeConsequences } from './role-change-consequences';

export interface MemberStatusDialogData {
  readonly member: Member;
  readonly action: 'deactivate' | 'reactivate';
}

/**
 * Asks before deactivating or reactivating a member, saying what happens; closes with `true`
 * once the server has done it.
 */
@Component({
  selector: 'app-member-status-dialog',
  imports: [MatButton, MatDialogModule],
  template: `
    <h2 mat-dialog-title>
      {{ action === 'deactivate' ? 'Deactivate' : 'Reactivate' }} {{ member.name }}?
    </h2>
    <mat-dialog-content>
      <p class="status-dialog__email">{{ member.email }}</p>
      <ul class="status-dialog__consequences" data-testid="status-consequences">
        @for (sentence of consequences; track sentence) {
          <li>{{ sentence }}</li>
        }
      </ul>
      @if (problem(); as message) {
        <p class="status-dialog__error" role="alert">{{ message }}</p>
      }
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" mat-dialog-close>Cancel</button>
      <button mat-flat-button type="button" [disabled]="working()" (click)="confirm()">
        {{ action === 'deactivate' ? 'Deactivate' : 'Reactivate' }}
      </button>
    </mat-dialog-actions>
  `,
  styles: `
    .status-dialog__email {
      margin: 0 0 8px;
      color: var(--mat-sys-on-surface-variant);
      overflow-wrap: anywhere;
    }
    .status-dialog__consequences {
      margin: 0;
      padding-left: 20px;
    }
    .status-dialog__consequences li {
      margin: 4px 0;
    }
    .status-dialog__error {
      margin: 8px 0 0;
      color: var(--mat-sys-error);
    }
    mat-dialog-actions button {
      min-height: 48px;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class MemberStatusDialog {
  private readonly api = inject(MembersApi);
  private readonly dialogRef = inject<MatDialogRef<MemberStatusDialog, boolean>>(MatDialogRef);
  private readonly data = inject<MemberStatusDialogData>(MAT_DIALOG_DATA);
  protected readonly member = this.data.member;
  protected readonly action = this.data.action;
  protected readonly consequences = statusChangeConsequences(this.data.action);

  protected readonly working = signal(false);
  protected readonly problem = signal<string | null>(null);

  protected confirm(): void {
    if (this.working()) return;
    this.working.set(true);
    this.problem.set(null);
    const call =
      this.action === 'deactivate'
        ? this.api.deactivate(this.member.userId)
        : this.api.reactivate(this.member.userId);
    call.subscribe({
      next: () => this.dialogRef.close(true),
      error: (error: unknown) => {
        this.working.set(false);
        this.problem.set(readApiProblem(error).message);
      },
    });
  }
}
