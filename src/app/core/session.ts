import { HttpClient, HttpErrorResponse } from '@angular/common/http';
import { Injectable, computed, inject, signal } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import type { Role } from '@shared/auth/roles';
import type { SessionInfo } from '@shared/auth/session';
import { withoutErrorNotice } from './error-notice-context';
import { PageNavigator } from './page-navigator';

/** Where the browser stands with the server: not asked yet, signed in, signed out, or no answer. */
export type SessionState =
  | { readonly status: 'unknown' }
  | { readonly status: 'signed-in'; readonly info: SessionInfo }
  | { readonly status: 'signed-out' }
  | { readonly status: 'unreachable' };

/** The signed-in person, their organisation and roles, as `GET /api/session` reports them. */
@Injectable({ providedIn: 'root' })
export class Session {
  private readonly http = inject(HttpClient);
  private readonly navigator = inject(PageNavigator);
  private readonly state = signal<SessionState>({ status: 'unknown' });
  private pendingLoad: Promise<void> | null = null;

  readonly current = this.state.asReadonly();
  readonly info = computed(() => {
    const state = this.state();
    return state.status === 'signed-in' ? state.info : null;
  });
  readonly signedIn = computed(() => this.state().status === 'signed-in');
  readonly roles = computed<readonly Role[]>(() => this.info()?.roles ?? []);
  readonly csrfToken = computed(() => this.info()?.csrfToken ?? null);

  hasRole(role: Role): boolean {
    return this.roles().includes(role);
  }

  hasAnyRole(wanted: readonly Role[]): boolean {
    return wanted.some((role) => this.hasRole(role));
  }

  /** Asks the server once; later calls share the first answer until `refresh()`. */
  ensureLoaded(): Promise<void> {
    this.pendingLoad ??= this.fetchSession();
    return this.pendingLoad;
  }

  refresh(): Promise<void> {
    this.pendingLoad = this.fetchSession();
    return this.pendingLoad;
  }

  /** Called when the server answers 401 to an API call: the server-side session has ended. */
  markSignedOut(): void {
    this.state.set({ status: 'signed-out' });
    this.pendingLoad = Promise.resolve();
  }

  async signOut(): Promise<void> {
    await firstValueFrom(this.http.post('/auth/sign-out', null));
    this.markSignedOut();
    this.navigator.goTo('/');
  }

  private async fetchSession(): Promise<void> {
    try {
      const info = await firstValueFrom(
        this.http.get<SessionInfo>('/api/session', { context: withoutErrorNotice() }),
      );
      this.state.set({ status: 'signed-in', info });
    } catch (error) {
      const signedOut = error instanceof HttpErrorResponse && error.status === 401;
      this.state.set({ status: signedOut ? 'signed-out' : 'unreachable' });
    }
  }
}
