import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MAT_DIALOG_DATA, MatDialogRef } from '@angular/material/dialog';
import type { Member } from '@shared/members/member';
import { RoleDialog, RoleDialogData } from './role-dialog';

const member: Member = {
  userId: '3a4b5c6d-7e8f-4a0b-9c1d-2e3f4a5b6c7d',
  name: 'Kofi Mensah',
  email: 'kofi@example.org',
  roles: ['supervisor'],
  joinedAt: '2026-02-01T08:00:00.000Z',
  deactivatedAt: null,
};

describe('RoleDialog', () => {
  let fixture: ComponentFixture<RoleDialog>;
  let element: HTMLElement;
  let server: HttpTestingController;
  const close = vi.fn();

  beforeEach(async () => {
    close.mockReset();
    TestBed.configureTestingModule({
      imports: [RoleDialog],
      providers: [
        provideHttpClient(),
        provideHttpClientTesting(),
        { provide: MAT_DIALOG_DATA, useValue: { member } satisfies RoleDialogData },
        { provide: MatDialogRef, useValue: { close } },
      ],
    });
    server = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(RoleDialog);
    element = fixture.nativeElement as HTMLElement;
    await fixture.whenStable();
  });

  afterEach(() => server.verify());

  function toggle(role: string): void {
    const box = Array.from(element.querySelectorAll('mat-checkbox')).find(
      (b) => b.textContent?.trim() === role,
    )!;
    box.querySelector('input')!.click();
  }

  function saveButton(): HTMLButtonElement {
    return Array.from(element.querySelectorAll('button')).find((b) =>
      b.textContent?.includes('Save roles'),
    )!;
  }

  it('starts from the member’s current roles', () => {
    const checked = Array.from(element.querySelectorAll<HTMLInputElement>('mat-checkbox input'))
      .filter((input) => input.checked)
      .map((input) => input.closest('mat-checkbox')?.textContent?.trim());
    expect(checked).toEqual(['Supervisor']);
  });

  it('refuses to save with no role at all', async () => {
    toggle('Supervisor');
    await fixture.whenStable();
    expect(saveButton().disabled).toBe(true);
    expect(element.textContent).toContain('Choose at least one role.');
  });

  it('saves the chosen roles and closes', async () => {
    toggle('Researcher');
    await fixture.whenStable();
    saveButton().click();
    const request = server.expectOne(`/api/members/${member.userId}/roles`);
    expect(request.request.method).toBe('PUT');
    expect(request.request.body).toEqual({ roles: ['supervisor', 'researcher'] });
    request.flush(null, { status: 204, statusText: 'No Content' });
    expect(close).toHaveBeenCalledWith(true);
  });

  it('keeps the dialog open and shows why when the server refuses', async () => {
    toggle('Administrator');
    await fixture.whenStable();
    saveButton().click();
    server
      .expectOne(`/api/members/${member.userId}/roles`)
      .flush(
        { error: { code: 'last-admin', message: 'The organisation must keep one administrator.' } },
        { status: 409, statusText: 'Conflict' },
      );
    await fixture.whenStable();
    expect(close).not.toHaveBeenCalled();
    expect(element.querySelector('.role-dialog__error')?.textContent).toContain(
      'The organisation must keep one administrator.',
    );
  });
});
