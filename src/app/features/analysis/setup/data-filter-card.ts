import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { FormsModule } from '@angular/forms';
import { MatCardModule } from '@angular/material/card';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatRadioModule } from '@angular/material/radio';
import { MatSelectModule } from '@angular/material/select';
import type { FieldIssue } from '@shared/http/api-error';
import type { FieldRoute } from '@shared/routes/field-route';
import type { FitSetupValues } from './fit-setup-values';

/** Which accepted interviews a fit reads: dates, routes, regions and flagged interviews. */
@Component({
  selector: 'app-data-filter-card',
  imports: [
    FormsModule,
    MatCardModule,
    MatFormFieldModule,
    MatInput,
    MatRadioModule,
    MatSelectModule,
  ],
  template: `
    <mat-card appearance="outlined">
      <mat-card-header>
        <mat-card-title><h2 class="setup-card__title">1 · Data</h2></mat-card-title>
        <mat-card-subtitle
          >Accepted interviews only. Leave a list empty to take all.</mat-card-subtitle
        >
      </mat-card-header>
      <mat-card-content class="setup-card__grid">
        <mat-form-field>
          <mat-label>First day</mat-label>
          <input
            matInput
            type="date"
            name="from"
            [ngModel]="values().from"
            (ngModelChange)="changed.emit({ from: $event })"
          />
        </mat-form-field>
        <mat-form-field>
          <mat-label>Last day</mat-label>
          <input
            matInput
            type="date"
            name="to"
            [ngModel]="values().to"
            (ngModelChange)="changed.emit({ to: $event })"
          />
        </mat-form-field>
        <mat-form-field>
          <mat-label>Routes</mat-label>
          <mat-select
            multiple
            [value]="values().routeIds"
            (valueChange)="changed.emit({ routeIds: $event })"
            placeholder="All routes"
          >
            @for (route of routes(); track route.id) {
              <mat-option [value]="route.id">{{ route.name }}</mat-option>
            }
          </mat-select>
          <mat-hint>{{ routes().length }} route(s) in the study</mat-hint>
        </mat-form-field>
        <mat-form-field>
          <mat-label>Regions</mat-label>
          <mat-select
            multiple
            [value]="values().regions"
            (valueChange)="changed.emit({ regions: $event })"
            placeholder="All regions"
          >
            @for (region of regions(); track region) {
              <mat-option [value]="region">{{ region }}</mat-option>
            }
          </mat-select>
          <mat-hint>The sampling points’ strata</mat-hint>
        </mat-form-field>
        <div class="setup-card__wide setup-card__flags">
          <p id="flagged-label" class="setup-card__label">Interviews with quality flags</p>
          <mat-radio-group
            aria-labelledby="flagged-label"
            [value]="values().flagged"
            (change)="changed.emit({ flagged: $event.value })"
          >
            <mat-radio-button value="exclude">Leave out</mat-radio-button>
            <mat-radio-button value="include">Include</mat-radio-button>
          </mat-radio-group>
        </div>
        @for (issue of issues(); track issue.path + issue.message) {
          <p class="setup-card__issue setup-card__wide" role="alert">{{ issue.message }}</p>
        }
      </mat-card-content>
    </mat-card>
  `,
  styleUrl: './setup-card.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DataFilterCard {
  readonly values = input.required<FitSetupValues>();
  readonly routes = input.required<readonly FieldRoute[]>();
  readonly regions = input.required<readonly string[]>();
  readonly issues = input<readonly FieldIssue[]>([]);
  readonly changed = output<Partial<FitSetupValues>>();
}
