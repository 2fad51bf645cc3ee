import { ChangeDetectionStrategy, Component, computed, input, signal } from '@angular/core';
import { FormsModule } from '@angular/forms';
import { MatAnchor } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatCheckbox } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatInput } from '@angular/material/input';
import { MatRadioModule } from '@angular/material/radio';
import {
  interviewStatusLabels,
  interviewStatuses,
  type InterviewStatus,
} from '@shared/interviews/interview-status';
import { rawDataFormats } from '@shared/raw-data/raw-data-request';
import { rawDataLinks, type RawDataChoices } from './raw-data-links';

const formatLabels = { csv: 'CSV', xlsx: 'XLSX (with the dictionary as a sheet)' } as const;

/**
 * The study's interviews as a file for the team's own checks and archive, with the dictionary
 * that explains every column. Plain links: the browser downloads them with the session cookie.
 */
@Component({
  selector: 'app-study-raw-data-card',
  imports: [
    FormsModule,
    MatAnchor,
    MatCardModule,
    MatCheckbox,
    MatFormFieldModule,
    MatIcon,
    MatInput,
    MatRadioModule,
  ],
  templateUrl: './study-raw-data-card.html',
  styleUrl: './study-raw-data-card.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StudyRawDataCard {
  readonly studyId = input.required<string>();

  protected readonly choices = signal<RawDataChoices>({
    format: 'csv',
    states: [...interviewStatuses],
    from: '',
    to: '',
    flagged: 'include',
  });
  protected readonly links = computed(() => rawDataLinks(this.studyId(), this.choices()));
  protected readonly formats = rawDataFormats;
  protected readonly formatLabels = formatLabels;
  protected readonly states = interviewStatuses;
  protected readonly stateLabels = interviewStatusLabels;

  protected change(part: Partial<RawDataChoices>): void {
    this.choices.update((current) => ({ ...current, ...part }));
  }

  protected toggleState(state: InterviewStatus, on: boolean): void {
    const chosen = new Set(this.choices().states);
    if (on) chosen.add(state);
    else chosen.delete(state);
    // Keep the order of the review, whatever order the boxes were ticked in.
    this.change({ states: interviewStatuses.filter((s) => chosen.has(s)) });
  }
}
