import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import type { Invitation } from '@shared/members/invitation';
import { InviteForm } from './invite-form';

describe('InviteForm', () => {
  let fixture: ComponentFixture<InviteForm>;
  let element: HTMLElement;
  let server: HttpTestingController;

  beforeEach(async () => {
    TestBed.configureTestingModule({
      imports: [InviteForm],
      providers: [provideHttpClient(), provideHttpClientTesting()],
    });
    server = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(InviteForm);
    element = fixture.nativeElement as HTMLElement;
    await fixture.whenStable();
  });

  afterEach(() => server.verify());

  function type(label: 'name' | 'email', value: string): void {
    const input = element.querySelector<HTMLInputElement>(`input[formcontrolname="${label}"]`)!;
    input.value = value;
    input.dispatchEvent(new Event('input'));
  }

  function tick(role: string): void {
    const boxes = Array.from(element.querySelectorAll('mat-checkbox'));
    const box = boxes.find((b) => b.textContent?.trim() === role)!;
    box.querySelector('input')!.click();
  }

  async function submit(): Promise<void> {
    element.querySelector('form')!.dispatchEvent(new Event('submit'));
    await fixture.whenStable();
  }

  function errorOf(field: 'name' | 'email'): string | undefined {
    const input = element.querySelector(`input[formcontrolname="${field}"]`)!;
    return input.closest('mat-form-field')?.querySelector('mat-error')?.textContent?.trim();
  }

  it('checks the form with the shared rules before anything is sent', async () => {
    type('name', 'Rosa Lindqvist');
    type('email', 'not-an-address');
    await submit();
    server.expectNone('/api/invitations');
    expect(errorOf('email')).toBe('Enter a valid e-mail address');
    expect(element.querySelector('.roles__error')?.textContent).toContain(
      'Choose at least one role',
    );
  });

  it('shows the server’s field issues beside the right fields', async () => {
    type('name', 'Rosa Lindqvist');
    type('email', 'rosa@example.org');
    tick('Supervisor');
    await submit();
    const request = server.expectOne('/api/invitations');
    expect(request.request.body).toEqual({
      name: 'Rosa Lindqvist',
      email: 'rosa@example.org',
      roles: ['supervisor'],
    });
    request.flush(
      {
        error: {
          code: 'invalid-request',
          message: 'The invitation needs changes.',
          issues: [
            { path: 'email', message: 'This person is already a member' },
            { path: 'roles.0', message: 'Only one administrator may invite supervisors' },
          ],
        },
      },
      { status: 400, statusText: 'Bad Request' },
    );
    await fixture.whenStable();
    expect(errorOf('email')).toBe('This person is already a member');
    expect(errorOf('name')).toBeUndefined();
    expect(element.querySelector('.roles__error')?.textContent).toContain(
      'Only one administrator may invite supervisors',
    );
  });

  it('shows the refusal to invite a member beside the e-mail and announces nothing', async () => {
    type('name', 'Rosa Lindqvist');
    type('email', 'rosa@example.org');
    tick('Client');
    await submit();
    const message =
      'Rosa Lindqvist (rosa@example.org) is already a member. Change their roles in the list of people instead.';
    server
      .expectOne('/api/invitations')
      .flush(
        { error: { code: 'already-member', message, issues: [{ path: 'email', message }] } },
        { status: 409, statusText: 'Conflict' },
      );
    await fixture.whenStable();
    expect(errorOf('email')).toBe(message);
    expect(element.textContent).not.toContain('Invitation sent');
  });

  it('announces the invitation and clears the form once the server accepts it', async () => {
    const sent: Invitation[] = [];
    fixture.componentInstance.invited.subscribe((i) => sent.push(i));
    type('name', 'Rosa Lindqvist');
    type('email', 'rosa@example.org');
    tick('Client');
    await submit();
    const invitation: Invitation = {
      id: '1f2e3d4c-5b6a-4798-8a7b-6c5d4e3f2a1b',
      name: 'Rosa Lindqvist',
      email: 'rosa@example.org',
      roles: ['client'],
      status: 'pending',
      createdAt: '2026-12-01T08:00:00.000Z',
      expiresAt: '2026-12-15T08:00:00.000Z',
    };
    server.expectOne('/api/invitations').flush(invitation, { status: 201, statusText: 'Created' });
    await fixture.whenStable();
    expect(sent).toEqual([invitation]);
    expect(element.textContent).toContain('Invitation sent to rosa@example.org');
    expect(element.querySelector<HTMLInputElement>('input[formcontrolname="name"]')!.value).toBe(
      '',
    );
  });
});
