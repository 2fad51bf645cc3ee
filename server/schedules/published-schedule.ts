import type { FitSchedule, WeightingSummary } from '@shared/analysis/fit-result';

/** What a version row's `schedule` column holds: the schedule as published, frozen with it. */
export interface PublishedSchedule extends FitSchedule {
  readonly studyName: string;
  readonly productName: string;
  readonly methodLabel: string;
  readonly currency: string;
  readonly weighting: WeightingSummary | null;
}
