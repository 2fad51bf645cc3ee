import { ChangeDetectionStrategy, Component } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatDialogModule } from '@angular/material/dialog';

/**
 * Asks before unsaved edits are thrown away; closes with `true` only when the researcher
 * chooses to leave. Staying is the first focus, so a stray Enter keeps the work.
 */
@Component({
  selector: 'app-leave-dialog',
  imports: [MatButton, MatDialogModule],
  template: `
    <h2 mat-dialog-title>Leave without saving?</h2>
    <mat-dialog-content>
      <p>
        This draft has changes that are not saved yet. If you leave now, they are lost and the
        questionnaire stays as it was last saved.
      </p>
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" [mat-dialog-close]="true">Discard changes and leave</button>
      <button mat-flat-button type="button" [mat-dialog-close]="false" cdkFocusInitial>
        Stay and keep editing
      </button>
    </mat-dialog-actions>
  `,
  styles: `
    mat-dialog-actions button {
      min-height: 48px;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LeaveDialog {}
