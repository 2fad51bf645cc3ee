import { provideHttpClient } from '@angular/common/http';
import { provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import type { Role } from '@shared/auth/roles';
import { signInAs } from '../../testing/sign-in-as';
import { AppShell } from './app-shell';

describe('AppShell', () => {
  beforeEach(() => {
    TestBed.configureTestingModule({
      imports: [AppShell],
      providers: [provideHttpClient(), provideHttpClientTesting(), provideRouter([])],
    });
  });

  async function navLinks(roles: Role[]): Promise<string[]> {
    await signInAs(roles);
    const fixture = TestBed.createComponent(AppShell);
    await fixture.whenStable();
    const links = (fixture.nativeElement as HTMLElement).querySelectorAll('mat-nav-list a');
    return Array.from(links).map(
      (a) =>
        `${a.querySelector('[matListItemTitle]')!.textContent.trim()} ${a.getAttribute('href')}`,
    );
  }

  it('shows an administrator the administration pages', async () => {
    expect(await navLinks(['admin'])).toEqual([
      'Home /',
      'Devices /devices',
      'Members /members',
      'Access tokens /members/tokens',
      'System health /system-health',
    ]);
  });

  it('shows a field enumerator their field pages and no administration pages', async () => {
    expect(await navLinks(['enumerator'])).toEqual([
      'Home /',
      'My routes /field/routes',
      'Sync /field/sync',
    ]);
  });
});
