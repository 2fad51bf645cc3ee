import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { Component } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { Router, provideRouter } from '@angular/router';
import type { Role } from '@shared/auth/roles';
import { signInAs } from '../testing/sign-in-as';
import { roleGuard, signedInGuard } from './auth-guard';
import { Notices } from './notices';
import { Session } from './session';

@Component({ template: '' })
class Blank {}

describe('auth guards', () => {
  let router: Router;
  const show = vi.fn();

  beforeEach(() => {
    show.mockReset();
    TestBed.configureTestingModule({
      providers: [
        { provide: Notices, useValue: { show } },
        provideHttpClient(),
        provideHttpClientTesting(),
        provideRouter([
          { path: 'welcome', component: Blank },
          {
            path: '',
            canActivate: [signedInGuard],
            children: [
              { path: 'members', canMatch: [roleGuard('admin')], component: Blank },
              {
                path: 'review',
                canMatch: [roleGuard('supervisor', 'researcher')],
                component: Blank,
              },
              { path: '', component: Blank },
            ],
          },
        ]),
      ],
    });
    router = TestBed.inject(Router);
  });

  async function landingAfter(url: string, roles: Role[]): Promise<string> {
    await signInAs(roles);
    await router.navigateByUrl(url);
    return router.url;
  }

  it('lets an administrator open an admin page', async () => {
    expect(await landingAfter('/members', ['admin'])).toBe('/members');
  });

  it('sends someone without the role back home, saying in plain words why', async () => {
    expect(await landingAfter('/members', ['researcher', 'client'])).toBe('/');
    expect(show).toHaveBeenCalledTimes(1);
    const notice = String(show.mock.calls[0][0]);
    expect(notice).toBe('This page is not open to your account. Here is your home page instead.');
    expect(notice).not.toMatch(/role|admin/i);
  });

  it('admits anyone holding one of several allowed roles, without a notice', async () => {
    expect(await landingAfter('/review', ['researcher'])).toBe('/review');
    expect(show).not.toHaveBeenCalled();
  });

  it('sends a signed-out visitor to the welcome page, remembering where they were going', async () => {
    const loaded = TestBed.inject(Session).ensureLoaded();
    TestBed.inject(HttpTestingController)
      .expectOne('/api/session')
      .flush(null, { status: 401, statusText: 'Unauthorized' });
    await loaded;
    await router.navigateByUrl('/members');
    expect(router.url).toBe('/welcome?returnTo=%2Fmembers');
    expect(show).not.toHaveBeenCalled();
  });

  it('sends a signed-out visitor of the home page to the welcome page too', async () => {
    const loaded = TestBed.inject(Session).ensureLoaded();
    TestBed.inject(HttpTestingController)
      .expectOne('/api/session')
      .flush(null, { status: 401, statusText: 'Unauthorized' });
    await loaded;
    await router.navigateByUrl('/');
    expect(router.url).toBe('/welcome?returnTo=%2F');
  });
});
