import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { MatAnchor } from '@angular/material/button';
import { RouterLink } from '@angular/router';
import { StudyCardList, loadStudies } from '../../shared/study-card-list';
import { DevicesApi } from './devices-api';

/** The studies whose field devices the person may see; one study's devices open from here. */
@Component({
  selector: 'app-devices-studies-page',
  imports: [MatAnchor, RouterLink, StudyCardList],
  template: `
    <div class="fc-page">
      <h1 class="fc-page__title">Field devices</h1>
      <p class="fc-page__lead">
        The phones and tablets of each study's enumerators: when each last synced and how many
        interviews it still held. Sign out a lost or shared device here.
      </p>
      <app-study-card-list
        [loaded]="loaded()"
        [roles]="['supervisor', 'researcher', 'enumerator', 'client']"
        emptyText="You are on no study yet."
      >
        <ng-template let-study>
          <a mat-flat-button [routerLink]="['/devices', study.id]">
            Show devices<span class="fc-visually-hidden"> of {{ study.name }}</span>
          </a>
        </ng-template>
      </app-study-card-list>
    </div>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DevicesStudiesPage {
  protected readonly loaded = loadStudies(inject(DevicesApi).studies());
}
