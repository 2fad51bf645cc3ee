import { provideHttpClient } from '@angular/common/http';
import { provideRouter } from '@angular/router';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import type { Invitation } from '@shared/members/invitation';
import type { Member } from '@shared/members/member';
import { MembersPage } from './members-page';

const members: Member[] = [
  {
    userId: '0b6e2f0e-5a57-4b0c-9a3e-1f2d3c4b5a69',
    name: 'Tomas Ferreira',
    email: 'tomas@example.org',
    roles: ['admin', 'researcher'],
    joinedAt: '2026-03-04T09:00:00.000Z',
    deactivatedAt: null,
  },
  {
    userId: '5c7d8e9f-0a1b-4c2d-8e3f-4a5b6c7d8e9f',
    name: 'Amara Diallo',
    email: 'amara@example.org',
    roles: ['enumerator'],
    joinedAt: '2026-05-18T14:30:00.000Z',
    deactivatedAt: null,
  },
];

const invitations: Invitation[] = [
  {
    id: '9e8d7c6b-5a49-4382-9172-6a5b4c3d2e1f',
    name: 'Lena Brandt',
    email: 'lena@example.org',
    roles: ['supervisor'],
    status: 'pending',
    createdAt: '2026-11-28T10:00:00.000Z',
    expiresAt: '2026-12-12T10:00:00.000Z',
  },
];

describe('MembersPage', () => {
  let server: HttpTestingController;

  beforeEach(() => {
    TestBed.configureTestingModule({
      imports: [MembersPage],
      providers: [provideHttpClient(), provideHttpClientTesting(), provideRouter([])],
    });
    server = TestBed.inject(HttpTestingController);
  });

  afterEach(() => server.verify());

  async function renderWith(
    memberList: Member[],
    invitationList: Invitation[],
  ): Promise<HTMLElement> {
    const fixture = TestBed.createComponent(MembersPage);
    server.expectOne('/api/members').flush(memberList);
    server.expectOne('/api/invitations').flush(invitationList);
    await fixture.whenStable();
    return fixture.nativeElement as HTMLElement;
  }

  it('renders one table row per member with name, e-mail and role chips', async () => {
    const page = await renderWith(members, invitations);
    const rows = Array.from(page.querySelectorAll('tr.members-table__row'));
    expect(rows).toHaveLength(2);
    expect(rows[0].textContent).toContain('Tomas Ferreira');
    expect(rows[0].textContent).toContain('tomas@example.org');
    const chips = Array.from(rows[0].querySelectorAll('mat-chip')).map((c) =>
      c.textContent?.trim(),
    );
    expect(chips).toEqual(['Administrator', 'Researcher']);
    expect(rows[1].textContent).toContain('Enumerator');
    expect(page.textContent).toContain('People (2)');
  });

  it('lists the pending invitation with its status', async () => {
    const page = await renderWith(members, invitations);
    const item = page.querySelector('.invitation');
    expect(item?.textContent).toContain('Lena Brandt');
    expect(item?.textContent).toContain('Waiting');
    expect(item?.textContent).toContain('Supervisor');
  });

  it('offers to withdraw waiting invitations only', async () => {
    const accepted: Invitation = {
      ...invitations[0],
      id: '1a2b3c4d-5e6f-4a7b-8c9d-0e1f2a3b4c5d',
      name: 'Oskar Lindgren',
      status: 'accepted',
    };
    const page = await renderWith(members, [...invitations, accepted]);
    const items = Array.from(page.querySelectorAll('.invitation'));
    const withdrawOf = (name: string) =>
      items.find((i) => i.textContent?.includes(name))?.querySelector('.invitation__withdraw');
    expect(withdrawOf('Lena Brandt')?.getAttribute('aria-label')).toBe(
      'Withdraw the invitation to lena@example.org',
    );
    expect(withdrawOf('Oskar Lindgren')).toBeNull();
  });

  it('withdraws an invitation after confirmation and drops it from the list', async () => {
    const fixture = TestBed.createComponent(MembersPage);
    server.expectOne('/api/members').flush(members);
    server.expectOne('/api/invitations').flush(invitations);
    await fixture.whenStable();
    const page = fixture.nativeElement as HTMLElement;
    page.querySelector<HTMLButtonElement>('.invitation__withdraw')!.click();
    await fixture.whenStable();
    const confirm = Array.from(document.querySelectorAll('mat-dialog-container button')).find((b) =>
      b.textContent?.includes('Withdraw invitation'),
    ) as HTMLButtonElement;
    expect(confirm).toBeDefined();
    server.expectNone(`/api/invitations/${invitations[0].id}`);
    confirm.click();
    const request = server.expectOne(`/api/invitations/${invitations[0].id}`);
    expect(request.request.method).toBe('DELETE');
    request.flush(null, { status: 204, statusText: 'No Content' });
    // The dialog reports its result only once its closing animation has run.
    await new Promise((resolve) => setTimeout(resolve, 300));
    await fixture.whenStable();
    expect(page.querySelector('.invitation')).toBeNull();
    expect(page.textContent).toContain('No invitations yet.');
  });

  it('says so when nobody has joined', async () => {
    const page = await renderWith([], []);
    expect(page.querySelectorAll('tr.members-table__row')).toHaveLength(0);
    expect(page.textContent).toContain('Nobody has joined yet');
    expect(page.textContent).toContain('No invitations yet.');
  });

  it('shows the server’s message when the list cannot be loaded', async () => {
    const fixture = TestBed.createComponent(MembersPage);
    server
      .expectOne('/api/members')
      .flush(
        { error: { code: 'forbidden', message: 'Only administrators may list members.' } },
        { status: 403, statusText: 'Forbidden' },
      );
    server.expectOne('/api/invitations').flush([]);
    await fixture.whenStable();
    const alert = (fixture.nativeElement as HTMLElement).querySelector('[role="alert"]');
    expect(alert?.textContent).toContain('Only administrators may list members.');
  });
});
