import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatInput } from '@angular/material/input';
import { samplingPointKindLabels } from '@shared/sampling/sampling-point-kind';
import { RouteBuilderState } from './route-builder-state';

/** The study's points not on the route yet, searchable, each added with one tap. */
@Component({
  selector: 'app-point-picker',
  imports: [MatButton, MatCardModule, MatFormFieldModule, MatIcon, MatInput],
  templateUrl: './point-picker.html',
  styleUrls: ['./route-builder-parts.scss', './point-picker.scss'],
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PointPicker {
  protected readonly state = inject(RouteBuilderState);
  protected readonly kindLabels = samplingPointKindLabels;

  protected searchFor(event: Event): void {
    this.state.search.set((event.target as HTMLInputElement).value);
  }
}
