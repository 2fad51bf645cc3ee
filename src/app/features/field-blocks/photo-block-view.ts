import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import type { PhotoAnswer, PhotoBlock } from '@shared/questionnaire/blocks/photo-block';
import { PhotoPicker } from './photo-picker';

/** Photos of what the block asks for, up to its maximum. */
@Component({
  selector: 'app-photo-block-view',
  imports: [PhotoPicker],
  template: `
    <app-photo-picker
      [photoIds]="answer()?.photoIds ?? []"
      [max]="block().maxPhotos"
      [subject]="block().subject"
      (photoIdsChange)="answerChange.emit($event.length > 0 ? { photoIds: $event } : undefined)"
    />
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PhotoBlockView {
  readonly block = input.required<PhotoBlock>();
  readonly answer = input<PhotoAnswer | undefined>();
  readonly labelledBy = input<string>('');
  readonly answerChange = output<PhotoAnswer | undefined>();
}
