import { BreakpointObserver } from '@angular/cdk/layout';
import { DatePipe, NgTemplateOutlet } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input, output } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatIconButton } from '@angular/material/button';
import { MatChipsModule } from '@angular/material/chips';
import { MatIcon } from '@angular/material/icon';
import { MatTableModule } from '@angular/material/table';
import { type Role, roleLabels } from '@shared/auth/roles';
import type { Member } from '@shared/members/member';
import { map } from 'rxjs';

const wideColumns = ['name', 'email', 'roles', 'joined', 'actions'];
// On a phone everything about a person stacks in one cell, so nothing is squeezed letter by letter.
const narrowColumns = ['person', 'actions'];

/**
 * The organisation's members, with buttons to change each person's roles and to deactivate or
 * reactivate them.
 */
@Component({
  selector: 'app-member-table',
  imports: [DatePipe, NgTemplateOutlet, MatChipsModule, MatIcon, MatIconButton, MatTableModule],
  templateUrl: './member-table.html',
  styleUrl: './member-table.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class MemberTable {
  readonly members = input.required<readonly Member[]>();
  readonly editRoles = output<Member>();
  readonly deactivate = output<Member>();
  readonly reactivate = output<Member>();

  private readonly wide = toSignal(
    inject(BreakpointObserver)
      .observe('(min-width: 720px)')
      .pipe(map((state) => state.matches)),
    { initialValue: true },
  );
  protected readonly columns = computed(() => (this.wide() ? wideColumns : narrowColumns));

  protected labelOf(role: Role): string {
    return roleLabels[role];
  }
}
