import { CdkDrag, CdkDragDrop, CdkDragHandle, CdkDropList } from '@angular/cdk/drag-drop';
import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { MatIconButton } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatInput } from '@angular/material/input';
import { samplingPointKindLabels } from '@shared/sampling/sampling-point-kind';
import { RouteBuilderState } from './route-builder-state';

/**
 * The route's stops in visiting order: drag to reorder (or the arrow buttons, for keyboards and
 * screen readers), a quota per stop, and each stop's problem beside it.
 */
@Component({
  selector: 'app-stop-list-editor',
  imports: [
    CdkDropList,
    CdkDrag,
    CdkDragHandle,
    MatIconButton,
    MatCardModule,
    MatFormFieldModule,
    MatIcon,
    MatInput,
  ],
  templateUrl: './stop-list-editor.html',
  styleUrls: ['./route-builder-parts.scss', './stop-list-editor.scss'],
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StopListEditor {
  protected readonly state = inject(RouteBuilderState);
  protected readonly kindLabels = samplingPointKindLabels;

  protected dropStop(event: CdkDragDrop<unknown>): void {
    this.state.moveStop(event.previousIndex, event.currentIndex);
  }

  /** An emptied field is NaN, which the shared schema names as "must be a number". */
  protected quotaFrom(event: Event): number {
    const text = (event.target as HTMLInputElement).value;
    return text.trim() === '' ? Number.NaN : Number(text);
  }
}
