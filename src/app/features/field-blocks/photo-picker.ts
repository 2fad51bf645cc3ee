import {
  ChangeDetectionStrategy,
  Component,
  effect,
  inject,
  input,
  output,
  signal,
} from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { BLOCK_PHOTO_STORE } from './block-view-context';

let nextId = 0;

/**
 * Takes photos with the device camera (the browser's file input in camera mode), shows them
 * and lets one be removed. The capture screen says what to photograph and what never to.
 */
@Component({
  selector: 'app-photo-picker',
  imports: [MatButton, MatIcon],
  template: `
    <p class="photo__rule">
      <mat-icon aria-hidden="true">no_photography</mat-icon>
      Photograph price tags and shelves, not people.
    </p>
    @if (subject(); as what) {
      <p class="bv-hint">{{ what }}</p>
    }
    <ul class="photo__list" aria-label="Photos taken">
      @for (id of photoIds(); track id; let i = $index) {
        <li class="photo__item">
          @if (urls()[id]; as url) {
            <img [src]="url" [alt]="'Photo ' + (i + 1)" width="96" height="96" />
          } @else {
            <span class="photo__stored">Photo {{ i + 1 }} (sent)</span>
          }
          <button mat-button type="button" class="photo__remove" (click)="remove(id)">
            Remove photo {{ i + 1 }}
          </button>
        </li>
      }
    </ul>
    @if (photoIds().length < max()) {
      <label class="photo__take" [class.photo__take--busy]="busy()">
        <input
          class="fc-visually-hidden"
          type="file"
          accept="image/*"
          capture="environment"
          [id]="inputId"
          [disabled]="busy()"
          (change)="take($event)"
        />
        <mat-icon aria-hidden="true">photo_camera</mat-icon>
        {{ busy() ? 'Saving the photo…' : 'Take a photo' }}
      </label>
    }
    @if (problem(); as message) {
      <p class="bv-error" role="alert">{{ message }}</p>
    }
  `,
  styleUrl: './block-view.scss',
  styles: `
    .photo__rule {
      display: flex;
      align-items: center;
      gap: 8px;
      margin: 0 0 12px;
      padding: 8px 12px;
      border-radius: 8px;
      background: var(--mat-sys-secondary-container);
      color: var(--mat-sys-on-secondary-container);
      font: var(--mat-sys-title-small);
    }
    .photo__list {
      list-style: none;
      margin: 12px 0;
      padding: 0;
      display: flex;
      flex-wrap: wrap;
      gap: 12px;
    }
    .photo__item {
      display: grid;
      justify-items: center;
      gap: 4px;
      img {
        width: 96px;
        height: 96px;
        object-fit: cover;
        border-radius: 8px;
      }
    }
    .photo__remove {
      min-height: 48px;
    }
    .photo__take {
      display: inline-flex;
      align-items: center;
      justify-content: center;
      gap: 8px;
      min-height: 56px;
      padding: 0 24px;
      border-radius: 28px;
      background: var(--mat-sys-primary);
      color: var(--mat-sys-on-primary);
      font: var(--mat-sys-label-large);
      font-size: 1rem;
      cursor: pointer;
      &:has(input:focus-visible) {
        outline: 3px solid var(--mat-sys-tertiary);
        outline-offset: 2px;
      }
    }
    .photo__take--busy {
      opacity: 0.7;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PhotoPicker {
  private readonly store = inject(BLOCK_PHOTO_STORE);

  readonly photoIds = input<readonly string[]>([]);
  readonly max = input(1);
  readonly subject = input<string | null>(null);
  readonly photoIdsChange = output<string[]>();

  protected readonly inputId = `photo-input-${nextId++}`;
  protected readonly urls = signal<Record<string, string | null>>({});
  protected readonly busy = signal(false);
  protected readonly problem = signal<string | null>(null);

  constructor() {
    effect(() => {
      for (const id of this.photoIds()) {
        if (id in this.urls()) continue;
        void this.store.urlOf(id).then((url) => this.urls.update((all) => ({ ...all, [id]: url })));
      }
    });
  }

  protected async take(event: Event): Promise<void> {
    const field = event.target as HTMLInputElement;
    const file = field.files?.[0];
    field.value = '';
    if (!file) return;
    this.busy.set(true);
    this.problem.set(null);
    try {
      const id = await this.store.keep(file);
      this.photoIdsChange.emit([...this.photoIds(), id]);
    } catch (error) {
      this.problem.set(error instanceof Error ? error.message : 'The photo could not be kept.');
    } finally {
      this.busy.set(false);
    }
  }

  protected async remove(id: string): Promise<void> {
    this.photoIdsChange.emit(this.photoIds().filter((held) => held !== id));
    await this.store.drop(id);
  }
}
