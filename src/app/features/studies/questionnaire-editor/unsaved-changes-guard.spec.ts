import { EnvironmentInjector, runInInjectionContext } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { MatDialog } from '@angular/material/dialog';
import type { ActivatedRouteSnapshot, RouterStateSnapshot } from '@angular/router';
import { type Observable, firstValueFrom, isObservable, of } from 'rxjs';
import { LeaveDialog } from './leave-dialog';
import { type HoldsUnsavedChanges, unsavedChangesGuard } from './unsaved-changes-guard';

describe('unsavedChangesGuard', () => {
  const open = vi.fn();

  beforeEach(() => {
    open.mockReset();
    TestBed.configureTestingModule({ providers: [{ provide: MatDialog, useValue: { open } }] });
  });

  function leave(page: HoldsUnsavedChanges | null) {
    const state = {} as RouterStateSnapshot;
    return runInInjectionContext(TestBed.inject(EnvironmentInjector), () =>
      unsavedChangesGuard(page as HoldsUnsavedChanges, {} as ActivatedRouteSnapshot, state, state),
    );
  }

  async function answer(choice: boolean | undefined) {
    open.mockReturnValue({ afterClosed: () => of(choice) });
    const decision = leave({ hasUnsavedChanges: () => true });
    expect(isObservable(decision)).toBe(true);
    return firstValueFrom(decision as Observable<boolean>);
  }

  it('lets the page go without asking when nothing is unsaved', () => {
    expect(leave({ hasUnsavedChanges: () => false })).toBe(true);
    expect(leave(null)).toBe(true);
    expect(open).not.toHaveBeenCalled();
  });

  it('asks with the leave dialog when there are unsaved changes', async () => {
    await answer(false);
    expect(open).toHaveBeenCalledWith(LeaveDialog);
  });

  it('leaves only when the researcher chooses to discard the changes', async () => {
    expect(await answer(true)).toBe(true);
  });

  it('stays when the researcher keeps editing', async () => {
    expect(await answer(false)).toBe(false);
  });

  it('stays when the dialog is closed without a choice', async () => {
    expect(await answer(undefined)).toBe(false);
  });
});
