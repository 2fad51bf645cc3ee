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
import {
  defaultTokenLifetimeDays,
  type ApiToken,
  type IssuedApiToken,
} from '@shared/analysis/api-token';
import type { Study } from '@shared/studies/study';
import { MatCheckbox } from '@angular/material/checkbox';
import { MatOption } from '@angular/material/core';
import { MatSelect } from '@angular/material/select';
import { tokenStatus } from '@shared/analysis/token-status';
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
    MatCheckbox,
    MatOption,
    MatSelect,
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
  protected readonly lifetimes = [30, 90, 180, 365] as const;
  protected readonly expiresInDays = signal<number>(defaultTokenLifetimeDays);
  /** The client's studies, and the ones the next token is restricted to (none: all of them). */
  protected readonly studies = signal<readonly Study[]>([]);
  protected readonly restrictTo = signal<readonly string[]>([]);
  protected readonly statusOf = tokenStatus;

  constructor() {
    void this.loadTokens();
    this.api.listStudies().subscribe({
      next: (studies) => this.studies.set(studies),
      error: () => this.studies.set([]),
    });
  }

  protected toggleStudy(studyId: string, chosen: boolean): void {
    this.restrictTo.update((ids) =>
      chosen ? [...ids, studyId] : ids.filter((id) => id !== studyId),
    );
  }

  protected studyNames(ids: readonly string[]): string {
    return ids.map((id) => this.studies().find((s) => s.id === id)?.name ?? 'a study').join(', ');
  }

  protected async issueToken(): Promise<void> {
    this.busy.set(true);
    this.problem.set(null);
    try {
      const restriction = this.restrictTo();
      const token = await firstValueFrom(
        this.api.issueToken({
          name: this.name().trim(),
          expiresInDays: this.expiresInDays(),
          ...(restriction.length > 0 ? { studyIds: [...restriction] } : {}),
        }),
      );
      this.restrictTo.set([]);
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
