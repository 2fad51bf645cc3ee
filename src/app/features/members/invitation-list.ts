import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { roleLabels } from '@shared/auth/roles';
import type { Invitation } from '@shared/members/invitation';

const statusLabels: Record<Invitation['status'], { text: string; icon: string }> = {
  pending: { text: 'Waiting', icon: 'schedule_send' },
  accepted: { text: 'Accepted', icon: 'how_to_reg' },
  expired: { text: 'Expired', icon: 'timer_off' },
};

/** Invitations sent so far, those still waiting first; a waiting one can be withdrawn. */
@Component({
  selector: 'app-invitation-list',
  imports: [DatePipe, MatButton, MatIcon],
  templateUrl: './invitation-list.html',
  styleUrl: './invitation-list.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class InvitationList {
  readonly invitations = input.required<readonly Invitation[]>();
  readonly withdraw = output<Invitation>();

  protected readonly statusLabels = statusLabels;
  protected readonly sorted = computed(() =>
    [...this.invitations()].sort(
      (a, b) =>
        Number(b.status === 'pending') - Number(a.status === 'pending') ||
        b.createdAt.localeCompare(a.createdAt),
    ),
  );

  protected roleNames(invitation: Invitation): string {
    return invitation.roles.map((role) => roleLabels[role]).join(', ');
  }
}
