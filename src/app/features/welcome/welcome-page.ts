import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { Router } from '@angular/router';
import { Session } from '../../core/session';
import { safeReturnPath, signInHref } from '../../core/sign-in-link';

/** The public landing page: what Fieldcurve is, and the way in. */
@Component({
  selector: 'app-welcome-page',
  imports: [MatButton, MatIcon],
  templateUrl: './welcome-page.html',
  styleUrl: './welcome-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class WelcomePage {
  private readonly session = inject(Session);
  private readonly router = inject(Router);

  /** Bound from the `returnTo` query parameter. */
  readonly returnTo = input<string>();

  protected readonly signInLink = computed(() => signInHref(this.returnTo()));
  protected readonly serverUnreachable = computed(
    () => this.session.current().status === 'unreachable',
  );

  protected async retryConnection(): Promise<void> {
    await this.session.refresh();
    if (this.session.signedIn()) {
      await this.router.navigateByUrl(safeReturnPath(this.returnTo()));
    }
  }
}
