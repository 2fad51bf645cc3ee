import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatIcon } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import { roleLabels } from '@shared/auth/roles';
import { Session } from '../../core/session';
import { HomeCounts } from './home-counts';
import { roleWelcomeOrder, roleWelcomes } from './role-welcome';

/**
 * A welcome card for each role the signed-in person holds: what the role does, where its work
 * is, links to its pages and, where the app has it to hand, a figure of where things stand.
 */
@Component({
  selector: 'app-home-page',
  imports: [MatButton, MatCardModule, MatIcon, RouterLink],
  templateUrl: './home-page.html',
  styleUrl: './home-page.scss',
  providers: [HomeCounts],
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class HomePage {
  private readonly session = inject(Session);
  private readonly counts = inject(HomeCounts);

  protected readonly info = this.session.info;
  protected readonly firstName = computed(() => this.info()?.user.name.split(' ')[0] ?? '');
  protected readonly cards = computed(() =>
    roleWelcomeOrder
      .filter((role) => this.session.hasRole(role))
      .map((role) => {
        const welcome = roleWelcomes[role];
        const count = welcome.count ? this.counts.values()[welcome.count.of] : undefined;
        const figure = welcome.count && count !== undefined ? welcome.count.words(count) : null;
        return { role, label: roleLabels[role], ...welcome, figure };
      }),
  );

  constructor() {
    this.counts.load(this.session.roles());
  }
}
