import { ChangeDetectionStrategy, Component, input, output, signal } from '@angular/core';
import { MatIcon } from '@angular/material/icon';

/** A chosen file's name and text. */
export interface PickedFile {
  readonly name: string;
  readonly text: string;
}

/**
 * Where a supervisor drops a CSV file or picks one: the whole zone is a labelled file input, so
 * it works by touch, keyboard and screen reader as well as by dragging.
 */
@Component({
  selector: 'app-csv-drop-zone',
  imports: [MatIcon],
  template: `
    <label
      class="drop-zone"
      [class.drop-zone--over]="dragging()"
      [class.drop-zone--busy]="busy()"
      (dragenter)="showDrop($event)"
      (dragover)="showDrop($event)"
      (dragleave)="dragging.set(false)"
      (drop)="takeDroppedFile($event)"
    >
      <mat-icon aria-hidden="true">upload_file</mat-icon>
      <span class="drop-zone__title">Choose a CSV file</span>
      <span class="drop-zone__hint">or drop it here</span>
      <input
        class="drop-zone__input"
        type="file"
        accept=".csv,text/csv,text/plain"
        [disabled]="busy()"
        (change)="takeChosenFile($event)"
      />
    </label>
  `,
  styleUrl: './csv-drop-zone.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CsvDropZone {
  readonly busy = input(false);
  readonly picked = output<PickedFile>();

  protected readonly dragging = signal(false);

  protected showDrop(event: DragEvent): void {
    event.preventDefault();
    this.dragging.set(true);
  }

  protected takeDroppedFile(event: DragEvent): void {
    event.preventDefault();
    this.dragging.set(false);
    const file = event.dataTransfer?.files.item(0);
    if (file && !this.busy()) void this.read(file);
  }

  protected takeChosenFile(event: Event): void {
    const inputElement = event.target as HTMLInputElement;
    const file = inputElement.files?.item(0);
    // Cleared so choosing the same file again (after fixing it) fires another change.
    if (file) void this.read(file).finally(() => (inputElement.value = ''));
  }

  private async read(file: File): Promise<void> {
    this.picked.emit({ name: file.name, text: await file.text() });
  }
}
