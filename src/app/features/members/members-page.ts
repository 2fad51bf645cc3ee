import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { MatAnchor, MatButton } from '@angular/material/button';
import { RouterLink } from '@angular/router';
import { MatCardModule } from '@angular/material/card';
import { MatDialog } from '@angular/material/dialog';
import { MatProgressBar } from '@angular/material/progress-bar';
import { MatSnackBar } from '@angular/material/snack-bar';
import type { Invitation } from '@shared/members/invitation';
import type { Member } from '@shared/members/member';
import { readApiProblem } from '../../core/api-problem';
import { Session } from '../../core/session';
import { InvitationList } from './invitation-list';
import { InviteForm } from './invite-form';
import { MemberTable } from './member-table';
import { MembersApi } from './members-api';
import { RoleDialog, RoleDialogData } from './role-dialog';
import { WithdrawDialog, type WithdrawDialogData } from './withdraw-dialog';
import { MemberStatusDialog, type MemberStatusDialogData } from './member-status-dialog';

/** The administrator's view of who belongs to the organisation and who has been invited. */
@Component({
  selector: 'app-members-page',
  imports: [
    MatAnchor,
    MatButton,
    RouterLink,
    MatCardModule,
    MatProgressBar,
    InvitationList,
    InviteForm,
    MemberTable,
  ],
  templateUrl: './members-page.html',
  styleUrl: './members-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class MembersPage {
  private readonly api = inject(MembersApi);
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);

  protected readonly organisation = inject(Session).info()?.organisation.name ?? '';
  protected readonly members = signal<readonly Member[]>([]);
  protected readonly invitations = signal<readonly Invitation[]>([]);
  protected readonly loading = signal(true);
  protected readonly loadError = signal<string | null>(null);

  constructor() {
    this.loadMembers();
    this.loadInvitations();
  }

  protected loadMembers(): void {
    this.loading.set(true);
    this.loadError.set(null);
    this.api.listMembers().subscribe({
      next: (members) => {
        this.members.set(members);
        this.loading.set(false);
      },
      error: (error: unknown) => {
        this.loadError.set(readApiProblem(error).message);
        this.loading.set(false);
      },
    });
  }

  protected loadInvitations(): void {
    this.api.listInvitations().subscribe({
      next: (invitations) => this.invitations.set(invitations),
      error: (error: unknown) => this.loadError.set(readApiProblem(error).message),
    });
  }

  protected openRoleDialog(member: Member): void {
    const data: RoleDialogData = { member };
    this.dialog
      .open<RoleDialog, RoleDialogData, boolean>(RoleDialog, {
        data,
        width: '28rem',
        maxWidth: '95vw',
      })
      .afterClosed()
      .subscribe((saved) => {
        if (!saved) return;
        this.snackBar.open(`Roles of ${member.name} saved.`, 'Close', { duration: 5000 });
        this.loadMembers();
      });
  }

  protected changeStatus(member: Member, action: MemberStatusDialogData['action']): void {
    const data: MemberStatusDialogData = { member, action };
    this.dialog
      .open<MemberStatusDialog, MemberStatusDialogData, boolean>(MemberStatusDialog, {
        data,
        width: '28rem',
        maxWidth: '95vw',
      })
      .afterClosed()
      .subscribe((done) => {
        if (!done) return;
        const what = action === 'deactivate' ? 'deactivated' : 'reactivated';
        this.snackBar.open(`${member.name} ${what}.`, 'Close', { duration: 5000 });
        this.loadMembers();
      });
  }

  protected confirmWithdrawal(invitation: Invitation): void {
    const data: WithdrawDialogData = { invitation };
    this.dialog
      .open<WithdrawDialog, WithdrawDialogData, boolean>(WithdrawDialog, {
        data,
        width: '28rem',
        maxWidth: '95vw',
      })
      .afterClosed()
      .subscribe((withdrawn) => {
        if (!withdrawn) return;
        this.invitations.update((list) => list.filter((i) => i.id !== invitation.id));
        this.snackBar.open(`Invitation to ${invitation.email} withdrawn.`, 'Close', {
          duration: 5000,
        });
      });
  }

  protected addInvitation(invitation: Invitation): void {
    this.invitations.update((list) => [invitation, ...list.filter((i) => i.id !== invitation.id)]);
  }
}
