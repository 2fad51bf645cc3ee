import { Clipboard } from '@angular/cdk/clipboard';
import { DatePipe, DOCUMENT } from '@angular/common';
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { FormsModule } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatInput } from '@angular/material/input';
import { MatSnackBar } from '@angular/material/snack-bar';
import { RouterLink } from '@angular/router';
import type { ApiToken, IssuedApiToken } from '@shared/analysis/api-token';
import { readApiDocumentPath } from '@shared/analysis/portal-paths';
import { firstValueFrom } from 'rxjs';
import { readApiProblem } from '../../core/api-problem';
import { PortalApi } from './portal-api';

/**
 * Access tokens for the read API: issue one (its secret is shown this once), see which exist and
 * when they were last used, revoke one; with the link to the OpenAPI document.
 */
@Component({
  selector: 'app-api-tokens-page',
  imports: [
    DatePipe,
    FormsModule,
    MatButton,
    MatCardModule,
    MatFormFieldModule,
    MatIcon,
    MatInput,
    RouterLink,
  ],
  templateUrl: './api-tokens-page.html',
  styleUrl: './api-tokens-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ApiTokensPage {
  private readonly api = inject(PortalApi);
  private readonly clipboard = inject(Clipboard);
  private readonly snackBar = inject(MatSnackBar);

  protected readonly documentPath = readApiDocumentPath;
  protected readonly origin = inject(DOCUMENT).location.origin;
  protected readonly tokens = signal<readonly ApiToken[]>([]);
  protected readonly name = signal('');
  protected readonly issued = signal<IssuedApiToken | null>(null);
  protected readonly problem = signal<string | null>(null);
  protected readonly busy = signal(false);

  constructor() {
    void this.loadTokens();
  }

  protected async issueToken(): Promise<void> {
    this.busy.set(true);
    this.problem.set(null);
    try {
      const token = await firstValueFrom(this.api.issueToken(this.name().trim()));
      this.issued.set(token);
      this.name.set('');
      await this.loadTokens();
    } catch (error) {
      this.problem.set(readApiProblem(error).message);
    } finally {
      this.busy.set(false);
    }
  }

  protected copyToken(token: string): void {
    const copied = this.clipboard.copy(token);
    this.snackBar.open(
      copied ? 'Token copied.' : 'Select the token and copy it by hand.',
      'Close',
      {
        duration: 4000,
      },
    );
  }

  protected async revokeToken(token: ApiToken): Promise<void> {
    this.problem.set(null);
    try {
      await firstValueFrom(this.api.revokeToken(token.id));
      if (this.issued()?.id === token.id) this.issued.set(null);
      this.snackBar.open(`“${token.name}” revoked: it no longer opens the API.`, 'Close', {
        duration: 5000,
      });
      await this.loadTokens();
    } catch (error) {
      this.problem.set(readApiProblem(error).message);
    }
  }

  private async loadTokens(): Promise<void> {
    try {
      this.tokens.set(await firstValueFrom(this.api.listTokens()));
    } catch (error) {
      this.problem.set(readApiProblem(error).message);
    }
  }
}
