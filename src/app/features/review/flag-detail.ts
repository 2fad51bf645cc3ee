import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { RouterLink } from '@angular/router';
import { qualityFlagLabels, type QualityFlag } from '@shared/field-sync/quality/quality-flag';
import type { Block } from '@shared/questionnaire/block';
import { flagDetail, interviewReference } from './review-words';

/**
 * One quality flag in words. A respondent interviewed before links to the earlier interviews,
 * so the supervisor can open both and decide which to keep.
 */
@Component({
  selector: 'app-flag-detail',
  imports: [RouterLink],
  template: `
    @if (earlierIds(); as ids) {
      <span>
        {{ duplicateLabel }}: same respondent as
        @for (id of ids; track id; let last = $last) {
          <a [routerLink]="['/review', studyId(), 'interviews', id]">{{ interviewReference(id) }}</a
          >{{ last ? '' : ', ' }}
        }
      </span>
    } @else {
      <span>{{ text() }}</span>
    }
  `,
  styles: `
    a {
      display: inline-block;
      min-height: 24px;
      padding: 2px 0;
      color: inherit;
      font-weight: 500;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class FlagDetail {
  readonly flag = input.required<QualityFlag>();
  readonly studyId = input.required<string>();
  /** The interview's questionnaire, to name a flagged block by its question. */
  readonly blocks = input<readonly Block[]>([]);

  protected readonly duplicateLabel = qualityFlagLabels['duplicate-respondent'];
  protected readonly interviewReference = interviewReference;
  protected readonly earlierIds = computed(() => {
    const flag = this.flag();
    return flag.kind === 'duplicate-respondent' ? flag.otherInterviewIds : null;
  });
  protected readonly text = computed(() => flagDetail(this.flag(), this.blocks()));
}
