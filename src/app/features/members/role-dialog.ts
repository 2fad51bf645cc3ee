import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import type { Role } from '@shared/auth/roles';
import type { Member } from '@shared/members/member';
import { readApiProblem } from '../../core/api-problem';
import { sortIssues } from './field-issues';
import { MembersApi } from './members-api';
import { RolePicker } from './role-picker';
import { roleChangeConsequences } from './role-change-consequences';

export interface RoleDialogData {
  readonly member: Member;
}

/** Changes one member's roles; closes with `true` once the server has saved them. */
@Component({
  selector: 'app-role-dialog',
  imports: [MatButton, MatDialogModule, RolePicker],
  templateUrl: './role-dialog.html',
  styles: `
    .role-dialog__email {
      margin: 0 0 16px;
      color: var(--mat-sys-on-surface-variant);
      overflow-wrap: anywhere;
    }
    .role-dialog__consequences {
      margin: 12px 0 0;
      padding: 8px 12px;
      border-radius: 8px;
      background: var(--mat-sys-surface-container-high);
    }
    .role-dialog__consequences p {
      margin: 4px 0;
    }
    .role-dialog__error {
      margin: 8px 0 0;
      color: var(--mat-sys-error);
    }
    mat-dialog-actions button {
      min-height: 48px;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RoleDialog {
  private readonly api = inject(MembersApi);
  private readonly dialogRef = inject<MatDialogRef<RoleDialog, boolean>>(MatDialogRef);
  protected readonly member = inject<RoleDialogData>(MAT_DIALOG_DATA).member;

  protected readonly chosen = signal<readonly Role[]>(this.member.roles);
  protected readonly saving = signal(false);
  protected readonly serverRolesError = signal<string | null>(null);
  protected readonly formError = signal<string | null>(null);
  /** What saving will do beyond the list (a role taken away goes from every study too). */
  protected readonly consequences = computed(() =>
    roleChangeConsequences(this.member.roles, this.chosen()),
  );
  protected readonly rolesError = computed(() =>
    this.chosen().length === 0 ? 'Choose at least one role.' : this.serverRolesError(),
  );

  protected saveRoles(): void {
    if (this.chosen().length === 0 || this.saving()) return;
    this.saving.set(true);
    this.formError.set(null);
    this.serverRolesError.set(null);
    this.api.updateRoles(this.member.userId, this.chosen()).subscribe({
      next: () => this.dialogRef.close(true),
      error: (error: unknown) => {
        this.saving.set(false);
        const problem = readApiProblem(error);
        const { byField, unplaced } = sortIssues(problem.issues, ['roles'] as const);
        this.serverRolesError.set(byField.roles ?? null);
        if (!byField.roles) this.formError.set(unplaced[0] ?? problem.message);
      },
    });
  }
}
