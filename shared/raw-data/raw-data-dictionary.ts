import type { InterviewFilter } from '../analysis/interview-filter';
import type { WeightingSpec } from '../analysis/weighting-spec';
import type { InterviewStatus } from '../interviews/interview-status';
import type { RawColumn } from './raw-data-column';

/** The data dictionary of a raw-data download: what was asked for and every column explained. */
export interface RawDataDictionary {
  readonly study: { readonly id: string; readonly name: string; readonly currency: string };
  readonly generatedAt: string;
  readonly filter: InterviewFilter;
  readonly states: readonly InterviewStatus[];
  readonly weighting: WeightingSpec | null;
  readonly questionnaireVersions: readonly { readonly id: string; readonly number: number }[];
  /** Seconds a photo link works after the download was made. */
  readonly photoLinkSeconds: number;
  readonly columns: readonly RawColumn[];
}
