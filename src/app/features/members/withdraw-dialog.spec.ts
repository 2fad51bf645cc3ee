import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MAT_DIALOG_DATA, MatDialogRef } from '@angular/material/dialog';
import type { Invitation } from '@shared/members/invitation';
import { WithdrawDialog, type WithdrawDialogData } from './withdraw-dialog';

const invitation: Invitation = {
  id: '6b7c8d9e-0f1a-4b2c-9d3e-4f5a6b7c8d9e',
  name: 'Ilse Marchetti',
  email: 'ilse@example.org',
  roles: ['client'],
  status: 'pending',
  createdAt: '2026-12-01T08:00:00.000Z',
  expiresAt: '2026-12-08T08:00:00.000Z',
};

describe('WithdrawDialog', () => {
  let fixture: ComponentFixture<WithdrawDialog>;
  let element: HTMLElement;
  let server: HttpTestingController;
  const close = vi.fn();

  beforeEach(async () => {
    close.mockReset();
    TestBed.configureTestingModule({
      imports: [WithdrawDialog],
      providers: [
        provideHttpClient(),
        provideHttpClientTesting(),
        { provide: MAT_DIALOG_DATA, useValue: { invitation } satisfies WithdrawDialogData },
        { provide: MatDialogRef, useValue: { close } },
      ],
    });
    server = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(WithdrawDialog);
    element = fixture.nativeElement as HTMLElement;
    await fixture.whenStable();
  });

  afterEach(() => server.verify());

  const withdrawButton = () =>
    Array.from(element.querySelectorAll('button')).find((b) =>
      b.textContent?.includes('Withdraw invitation'),
    )!;

  it('names the person and says what withdrawing does, before anything is sent', () => {
    expect(element.textContent).toContain('Ilse Marchetti (ilse@example.org)');
    expect(element.textContent).toContain('will no longer be able to join');
    server.expectNone(() => true);
  });

  it('withdraws on confirmation and closes with true', async () => {
    withdrawButton().click();
    const request = server.expectOne(`/api/invitations/${invitation.id}`);
    expect(request.request.method).toBe('DELETE');
    request.flush(null, { status: 204, statusText: 'No Content' });
    await fixture.whenStable();
    expect(close).toHaveBeenCalledWith(true);
  });

  it('stays open with the server’s message when the invitation was accepted meanwhile', async () => {
    withdrawButton().click();
    server.expectOne(`/api/invitations/${invitation.id}`).flush(
      {
        error: {
          code: 'invitation-accepted',
          message: 'That invitation has been accepted already.',
        },
      },
      { status: 409, statusText: 'Conflict' },
    );
    await fixture.whenStable();
    expect(close).not.toHaveBeenCalled();
    expect(element.querySelector('[role="alert"]')?.textContent).toContain(
      'That invitation has been accepted already.',
    );
    expect(withdrawButton().disabled).toBe(false);
  });
});
