import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatDivider } from '@angular/material/divider';
import { MatIcon } from '@angular/material/icon';
import { MatMenuModule } from '@angular/material/menu';
import { roleLabels } from '@shared/auth/roles';
import { Session } from '../session';

/** The signed-in person's name in the toolbar, with their roles and the way out. */
@Component({
  selector: 'app-account-menu',
  imports: [MatButton, MatDivider, MatIcon, MatMenuModule],
  templateUrl: './account-menu.html',
  styleUrl: './account-menu.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AccountMenu {
  private readonly session = inject(Session);

  protected readonly info = this.session.info;
  protected readonly roleNames = computed(() =>
    this.session
      .roles()
      .map((role) => roleLabels[role])
      .join(', '),
  );

  protected signOutEverywhere(): void {
    this.session.signOutEverywhere().catch(() => undefined);
  }

  protected signOut(): void {
    // A failure is reported by the error interceptor; the person stays signed in.
    this.session.signOut().catch(() => undefined);
  }
}
