import { HttpClient, HttpErrorResponse } from '@angular/common/http';
import { Injectable, computed, inject, signal } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import type { Role } from '@shared/auth/roles';
import type { SessionInfo } from '@shared/auth/session';
import { withoutErrorNotice } from './error-notice-context';
import { PageNavigator } from './page-navigator';
import { SessionCache } from './session-cache';

/** Where the browser stands with the server: not asked yet, signed in, signed out, or no answer. */
export type SessionState =
  | { readonly status: 'unknown' }
  | { readonly status: 'signed-in'; readonly info: SessionInfo; readonly fromCache?: boolean }
  | { readonly status: 'signed-out' }
  | { readonly status: 'unreachable' };

/** The signed-in person, their organisation and roles, as `GET /api/session` reports them. */
@Injectable({ providedIn: 'root' })
export class Session {
  private readonly http = inject(HttpClient);
  private readonly navigator = inject(PageNavigator);
  private readonly cache = inject(SessionCache);
  private readonly state = signal<SessionState>({ status: 'unknown' });
  private pendingLoad: Promise<void> | null = null;

  readonly current = this.state.asReadonly();
  readonly info = computed(() => {
    const state = this.state();
    return state.status === 'signed-in' ? state.info : null;
  });
  readonly signedIn = computed(() => this.state().status === 'signed-in');
  /** Signed in from the device's copy because the server could not be reached (field work). */
  readonly offline = computed(() => {
    const state = this.state();
    return state.status === 'signed-in' && state.fromCache === true;
  });
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
    void this.cache.forget().catch(() => undefined);
  }

  /**
   * Ends the person's sessions on every other device (each is told why at its next call), then
   * signs this browser out as usual.
   */
  async signOutEverywhere(): Promise<void> {
    await firstValueFrom(this.http.post('/api/session/sign-out-everywhere', {}));
    await this.signOut();
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
      void this.cache.remember(info).catch(() => undefined);
    } catch (error) {
      const signedOut = error instanceof HttpErrorResponse && error.status === 401;
      if (signedOut) return this.markSignedOut();
      // An enumerator who signed in once keeps working with no network (see SessionCache).
      const cached = await this.cache.recall().catch(() => null);
      this.state.set(
        cached ? { status: 'signed-in', info: cached, fromCache: true } : { status: 'unreachable' },
      );
    }
  }
}
