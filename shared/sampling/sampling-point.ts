import { z } from 'zod';
import { storableText } from '../storable/storable-text';
import { csvProblemSchema } from './csv-problem';
import { normaliseKind, samplingPointKindSchema, samplingPointKinds } from './sampling-point-kind';

const codePattern = /^[A-Za-z0-9][A-Za-z0-9._\-/]*$/;
const decimalPattern = /^[+-]?(\d+\.?\d*|\.\d+)$/;

const requiredText = (what: string, max: number) =>
  storableText()
    .trim()
    .min(1, { error: `Empty — every point needs ${what}.`, abort: true })
    .max(max, { error: `Longer than ${max} characters.` });

/** A decimal-degree cell: a plain decimal number within ±limit (no commas, no degree signs). */
const coordinate = (label: string, limit: number) =>
  z
    .string()
    .trim()
    .min(1, { error: `Empty — every point needs a ${label}.`, abort: true })
    .regex(decimalPattern, {
      error: (issue) => `"${String(issue.input)}" is not a decimal number such as 12.3456.`,
      abort: true,
    })
    .transform(Number)
    .pipe(
      z
        .number()
        .min(-limit, { error: (issue) => outOfRange(label, issue.input, limit) })
        .max(limit, { error: (issue) => outOfRange(label, issue.input, limit) }),
    );

function outOfRange(label: string, value: unknown, limit: number): string {
  return `${label[0].toUpperCase()}${label.slice(1)} ${String(value)} is outside −${limit} to ${limit}.`;
}

/**
 * One row of a sampling-point file, cell by cell as text, checked and turned into a point.
 * Messages name what is wrong and how to fix it; the importer adds the line and column.
 */
export const samplingPointRowSchema = z.object({
  code: requiredText('a code', 40).regex(codePattern, {
    error: 'Use letters, digits and . _ - / only, starting with a letter or digit.',
  }),
  name: requiredText('a name', 200),
  kind: z
    .string()
    .min(1, { error: 'Empty — every point needs a kind.', abort: true })
    .transform(normaliseKind)
    .pipe(
      z.enum(samplingPointKinds, {
        error: (issue) =>
          `"${String(issue.input)}" is not a kind; use one of ${samplingPointKinds.join(', ')}.`,
      }),
    ),
  latitude: coordinate('latitude', 90),
  longitude: coordinate('longitude', 180),
  stratum: requiredText('a stratum or region', 120),
  notes: storableText().trim().max(1000, { error: 'Longer than 1000 characters.' }).default(''),
});

/** A sampling point as a file or form describes it, before it is stored. */
export const samplingPointInputSchema = z.object({
  code: z.string(),
  name: z.string(),
  kind: samplingPointKindSchema,
  latitude: z.number(),
  longitude: z.number(),
  stratum: z.string(),
  notes: z.string(),
});
export type SamplingPointInput = z.infer<typeof samplingPointInputSchema>;

/** A stored sampling point, as `GET /api/studies/:studyId/sampling-points` lists it. */
export const samplingPointSchema = samplingPointInputSchema.extend({
  id: z.uuid(),
  updatedAt: z.string(),
});
export type SamplingPoint = z.infer<typeof samplingPointSchema>;

/** Body of the import route when sent as JSON rather than as `text/csv`. */
export const samplingImportRequestSchema = z.object({
  csv: z.string({ error: 'Send the file as a string in `csv`.' }),
});

/** What an accepted import changed: new codes, changed points, and points left as they were. */
export const samplingImportResultSchema = z.object({
  created: z.number().int(),
  updated: z.number().int(),
  unchanged: z.number().int(),
  points: z.array(samplingPointSchema),
});
export type SamplingImportResult = z.infer<typeof samplingImportResultSchema>;

/** The 400 body of a refused import: the usual error plus every problem by line and column. */
export const samplingImportRejectionSchema = z.object({
  error: z.object({
    code: z.literal('invalid-csv'),
    message: z.string(),
    problems: z.array(csvProblemSchema),
  }),
});
export type SamplingImportRejection = z.infer<typeof samplingImportRejectionSchema>;
