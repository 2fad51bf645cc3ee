import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatProgressBar } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import type { OrganisationApiToken } from '@shared/analysis/api-token';
import { readApiProblem } from '../../core/api-problem';
import { MembersApi } from './members-api';
import { tokenStatus } from '@shared/analysis/token-status';

/**
 * Every read-API token of the organisation, whoever issued it, with its owner, expiry and
 * restriction; an admin revokes any of them here (asked first, since the tool using it stops).
 */
@Component({
  selector: 'app-tokens-admin-page',
  imports: [DatePipe, MatButton, MatCardModule, MatProgressBar, RouterLink],
  templateUrl: './tokens-admin-page.html',
  styleUrl: './tokens-admin-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class TokensAdminPage {
  private readonly api = inject(MembersApi);

  protected readonly tokens = signal<readonly OrganisationApiToken[]>([]);
  protected readonly loading = signal(true);
  protected readonly problem = signal<string | null>(null);
  /** The token whose revocation is being confirmed, shown inline beside it. */
  protected readonly confirming = signal<string | null>(null);
  protected readonly statusOf = tokenStatus;

  constructor() {
    this.load();
  }

  protected load(): void {
    this.loading.set(true);
    this.api.listTokens().subscribe({
      next: (tokens) => {
        this.tokens.set(tokens);
        this.loading.set(false);
      },
      error: (error: unknown) => {
        this.problem.set(readApiProblem(error).message);
        this.loading.set(false);
      },
    });
  }

  protected revoke(token: OrganisationApiToken): void {
    this.problem.set(null);
    this.api.revokeToken(token.id).subscribe({
      next: (revoked) => {
        this.confirming.set(null);
        this.tokens.update((list) =>
          list.map((t) => (t.id === token.id ? { ...t, ...revoked } : t)),
        );
      },
      error: (error: unknown) => this.problem.set(readApiProblem(error).message),
    });
  }
}
