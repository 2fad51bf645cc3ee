import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import type { SessionInfo } from '@shared/auth/session';
import { signInAs, sessionInfoWith } from '../testing/sign-in-as';
import { PageNavigator } from './page-navigator';
import { Session } from './session';
import { SessionCache } from './session-cache';

/** The device's copy of the session, in memory. */
class MemorySessionCache {
  saved: SessionInfo | null = null;
  remember(info: SessionInfo): Promise<void> {
    this.saved = info.roles.includes('enumerator') ? info : null;
    return Promise.resolve();
  }
  recall(): Promise<SessionInfo | null> {
    return Promise.resolve(this.saved);
  }
  forget(): Promise<void> {
    this.saved = null;
    return Promise.resolve();
  }
}

describe('Session', () => {
  let session: Session;
  let server: HttpTestingController;
  let cache: MemorySessionCache;
  const goTo = vi.fn();

  beforeEach(() => {
    goTo.mockReset();
    cache = new MemorySessionCache();
    TestBed.configureTestingModule({
      providers: [
        provideHttpClient(),
        provideHttpClientTesting(),
        { provide: PageNavigator, useValue: { goTo } },
        { provide: SessionCache, useValue: cache },
      ],
    });
    session = TestBed.inject(Session);
    server = TestBed.inject(HttpTestingController);
  });

  afterEach(() => server.verify());

  it('holds no roles before the server has answered', () => {
    expect(session.current().status).toBe('unknown');
    expect(session.roles()).toEqual([]);
    expect(session.hasRole('admin')).toBe(false);
  });

  it('exposes the roles of the signed-in person and answers hasRole for each', async () => {
    await signInAs(['researcher', 'supervisor']);
    expect(session.signedIn()).toBe(true);
    expect(session.roles()).toEqual(['researcher', 'supervisor']);
    expect(session.hasRole('researcher')).toBe(true);
    expect(session.hasRole('supervisor')).toBe(true);
    expect(session.hasRole('admin')).toBe(false);
    expect(session.hasAnyRole(['admin', 'supervisor'])).toBe(true);
    expect(session.hasAnyRole(['admin', 'client'])).toBe(false);
  });

  it('treats a 401 from the session endpoint as signed out', async () => {
    const loaded = session.ensureLoaded();
    server.expectOne('/api/session').flush(null, { status: 401, statusText: 'Unauthorized' });
    await loaded;
    expect(session.current().status).toBe('signed-out');
    expect(session.roles()).toEqual([]);
  });

  it('tells a network failure apart from being signed out', async () => {
    const loaded = session.ensureLoaded();
    server.expectOne('/api/session').error(new ProgressEvent('error'));
    await loaded;
    expect(session.current().status).toBe('unreachable');
  });

  it('asks the server only once for concurrent callers', async () => {
    const first = session.ensureLoaded();
    const second = session.ensureLoaded();
    server.expectOne('/api/session').flush(null, { status: 401, statusText: 'Unauthorized' });
    await Promise.all([first, second]);
  });

  it('drops the roles and the token when marked signed out', async () => {
    await signInAs(['admin']);
    session.markSignedOut();
    expect(session.roles()).toEqual([]);
    expect(session.csrfToken()).toBeNull();
  });

  it('signs out with a POST and then leaves for the start page', async () => {
    await signInAs(['client']);
    const done = session.signOut();
    const request = server.expectOne('/auth/sign-out');
    expect(request.request.method).toBe('POST');
    request.flush(null, { status: 204, statusText: 'No Content' });
    await done;
    expect(session.signedIn()).toBe(false);
    expect(goTo).toHaveBeenCalledWith('/');
  });

  describe('on a device with no network', () => {
    async function loadWithoutNetwork(): Promise<void> {
      const loaded = session.ensureLoaded();
      server.expectOne('/api/session').error(new ProgressEvent('error'));
      await loaded;
    }

    it('opens the last enumerator session the device kept', async () => {
      cache.saved = sessionInfoWith(['enumerator']);
      await loadWithoutNetwork();
      expect(session.signedIn()).toBe(true);
      expect(session.offline()).toBe(true);
      expect(session.roles()).toEqual(['enumerator']);
    });

    it('hands an online enumerator session to the device to keep', async () => {
      const info = await signInAs(['enumerator']);
      expect(session.offline()).toBe(false);
      await Promise.resolve();
      expect(cache.saved).toEqual(info);
    });

    it('stays unreachable when no session was kept', async () => {
      await loadWithoutNetwork();
      expect(session.current().status).toBe('unreachable');
    });

    it('forgets the kept session when the server says it has ended', async () => {
      cache.saved = sessionInfoWith(['enumerator']);
      const loaded = session.ensureLoaded();
      server.expectOne('/api/session').flush(null, { status: 401, statusText: 'Unauthorized' });
      await loaded;
      expect(session.signedIn()).toBe(false);
      expect(cache.saved).toBeNull();
    });
  });
});
