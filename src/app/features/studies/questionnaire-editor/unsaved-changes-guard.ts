import { inject } from '@angular/core';
import { MatDialog } from '@angular/material/dialog';
import type { CanDeactivateFn } from '@angular/router';
import { type Observable, map } from 'rxjs';
import { LeaveDialog } from './leave-dialog';

/** A page that can hold edits the server has not stored yet. */
export interface HoldsUnsavedChanges {
  hasUnsavedChanges(): boolean;
}

/**
 * Asks with the leave dialog whether unsaved edits may go: `true` only when the person
 * chooses to discard (closing the dialog by Escape or a click outside keeps them).
 */
export function confirmDiscard(dialog: MatDialog): Observable<boolean> {
  return dialog
    .open<LeaveDialog, undefined, boolean>(LeaveDialog)
    .afterClosed()
    .pipe(map((leave) => leave === true));
}

/** Lets the router leave a page freely when nothing is unsaved; otherwise asks first. */
export const unsavedChangesGuard: CanDeactivateFn<HoldsUnsavedChanges> = (
  page,
): boolean | Observable<boolean> => {
  if (!page?.hasUnsavedChanges()) return true;
  return confirmDiscard(inject(MatDialog));
};
