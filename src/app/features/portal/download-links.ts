import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { MatAnchor } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { downloadUrl, type DownloadFormat } from './portal-api';

const formats: readonly { format: DownloadFormat; label: string; icon: string }[] = [
  { format: 'pdf', label: 'PDF report', icon: 'picture_as_pdf' },
  { format: 'xlsx', label: 'XLSX workbook', icon: 'table_view' },
  { format: 'csv', label: 'CSV table', icon: 'csv' },
];

/** The three downloads of a published version. */
@Component({
  selector: 'app-download-links',
  imports: [MatAnchor, MatIcon],
  template: `
    <div class="downloads" role="group" aria-label="Download this schedule">
      @for (item of formats; track item.format) {
        <a
          mat-stroked-button
          [href]="url(item.format)"
          [attr.download]="''"
          [attr.data-format]="item.format"
        >
          <mat-icon>{{ item.icon }}</mat-icon>
          {{ item.label }}
        </a>
      }
    </div>
  `,
  styles: `
    .downloads {
      display: flex;
      flex-wrap: wrap;
      gap: 8px;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DownloadLinks {
  readonly studyId = input.required<string>();
  readonly versionId = input.required<string>();
  protected readonly formats = formats;

  protected url(format: DownloadFormat): string {
    return downloadUrl(this.studyId(), this.versionId(), format);
  }
}
