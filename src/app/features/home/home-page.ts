import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatIcon } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import { roleLabels } from '@shared/auth/roles';
import { Session } from '../../core/session';
import { roleWelcomeOrder, roleWelcomes } from './role-welcome';

/** A welcome card for each role the signed-in person holds. */
@Component({
  selector: 'app-home-page',
  imports: [MatButton, MatCardModule, MatIcon, RouterLink],
  templateUrl: './home-page.html',
  styleUrl: './home-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class HomePage {
  private readonly session = inject(Session);

  protected readonly info = this.session.info;
  protected readonly firstName = computed(() => this.info()?.user.name.split(' ')[0] ?? '');
  protected readonly cards = computed(() =>
    roleWelcomeOrder
      .filter((role) => this.session.hasRole(role))
      .map((role) => ({ role, label: roleLabels[role], ...roleWelcomes[role] })),
  );
}
