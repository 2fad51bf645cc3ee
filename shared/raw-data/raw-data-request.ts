import { z } from 'zod';
import { interviewFilterSchema, type InterviewFilter } from '../analysis/interview-filter';
import { weightingSpecSchema, type WeightingSpec } from '../analysis/weighting-spec';
import { interviewStatuses, type InterviewStatus } from '../interviews/interview-status';

/** The raw-data downloads a study offers. */
export const rawDataFormats = ['csv', 'xlsx'] as const;
export type RawDataFormat = (typeof rawDataFormats)[number];

/**
 * What to download: the interviews the analysis filter matches, in the review states chosen
 * (all when none are given), with a raking weight when a weighting is given. Travels in the
 * address of a plain GET so the browser downloads it: `filter` and `weighting` as JSON text,
 * `states` as a comma-separated list.
 */
export interface RawDataRequest {
  readonly filter: InterviewFilter;
  readonly weighting?: WeightingSpec;
  readonly states?: readonly InterviewStatus[];
}

const jsonText = z.string().transform((text, ctx) => {
  try {
    return JSON.parse(text) as unknown;
  } catch {
    ctx.addIssue({ code: 'custom', message: 'Must be JSON text' });
    return z.NEVER;
  }
});

const statesText = z
  .string()
  .transform((text) => text.split(',').filter((s) => s !== ''))
  .pipe(
    z
      .array(z.enum(interviewStatuses, { error: `Choose among ${interviewStatuses.join(', ')}` }))
      .min(1, 'Choose at least one review state'),
  );

/** The query of a raw-data download, as it arrives. */
export const rawDataQuerySchema = z.strictObject({
  filter: jsonText.pipe(interviewFilterSchema).optional(),
  weighting: jsonText.pipe(weightingSpecSchema).optional(),
  states: statesText.optional(),
});

/** The query string (without `?`) that asks for `request`. */
export function rawDataQuery(request: RawDataRequest): string {
  const query = new URLSearchParams({ filter: JSON.stringify(request.filter) });
  if (request.weighting) query.set('weighting', JSON.stringify(request.weighting));
  if (request.states?.length) query.set('states', request.states.join(','));
  return query.toString();
}

/** The address of a study's raw-data download or its data dictionary. */
export function rawDataPath(studyId: string, file: RawDataFormat | 'dictionary'): string {
  const name = file === 'dictionary' ? 'dictionary.json' : `interviews.${file}`;
  return `/api/studies/${studyId}/raw-data/${name}`;
}
