import { provideHttpClient } from '@angular/common/http';
import { provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import type { Role } from '@shared/auth/roles';
import { signInAs } from '../../testing/sign-in-as';
import { HomePage } from './home-page';

describe('HomePage', () => {
  beforeEach(() => {
    TestBed.configureTestingModule({
      imports: [HomePage],
      providers: [provideHttpClient(), provideHttpClientTesting(), provideRouter([])],
    });
  });

  async function render(roles: Role[]): Promise<HTMLElement> {
    await signInAs(roles);
    const fixture = TestBed.createComponent(HomePage);
    await fixture.whenStable();
    return fixture.nativeElement as HTMLElement;
  }

  function cardTitles(page: HTMLElement): string[] {
    return Array.from(page.querySelectorAll('[matCardTitle]')).map((t) => t.textContent.trim());
  }

  it('greets the person and shows one card per role they hold', async () => {
    const page = await render(['client', 'admin']);
    expect(page.querySelector('h1')?.textContent).toContain('Welcome, Ines');
    expect(cardTitles(page)).toEqual(['Administrator', 'Client']);
    expect(page.textContent).toContain('What comes next');
  });

  it('links the administrator to the members page', async () => {
    const page = await render(['admin']);
    const link = page.querySelector('a[href="/members"]');
    expect(link?.textContent).toContain('Manage members');
  });

  it('offers no link to pages that do not exist yet', async () => {
    const page = await render(['researcher', 'supervisor', 'enumerator', 'client']);
    expect(page.querySelectorAll('mat-card-actions a')).toHaveLength(0);
  });

  it('explains what to do when the account holds no role', async () => {
    const page = await render([]);
    expect(cardTitles(page)).toEqual(['No role yet']);
  });
});
