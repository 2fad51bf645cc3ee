import { z } from 'zod';
import { storableText } from '../storable/storable-text';
import { roleSchema } from '../auth/role';
import { positiveMinorSchema } from '../money/minor-amount';
import { studyStatusSchema } from './study-status-change';

const currencies = new Set(Intl.supportedValuesOf('currency'));

function canonicalLocale(tag: string): string | null {
  try {
    return Intl.getCanonicalLocales(tag)[0] ?? null;
  } catch {
    return null;
  }
}

const text = (empty: string, max: number) =>
  storableText({ error: empty }).trim().min(1, empty).max(max, `Keep it under ${max} characters`);

/** Fields a researcher sets on a study; money is integer minor units of `currency`. */
const studyFieldsShape = {
  name: text('Give the study a name', 200),
  productName: text('Name the product', 200),
  secondProductName: text('Name the second product, or leave it out', 200).nullable().optional(),
  currency: z.string({ error: 'Choose a currency' }).refine((code) => currencies.has(code), {
    error: 'Use a currency code such as USD, EUR or KES (ISO 4217, in capitals)',
  }),
  locale: z
    .string({ error: 'Choose a locale' })
    .refine((tag) => canonicalLocale(tag) !== null, {
      error: 'Use a language tag such as en-GB, fr-SN or sw-KE',
    })
    .transform((tag) => canonicalLocale(tag) ?? tag),
  market: text('Describe the market', 2000),
  targetSample: z
    .int({ error: 'The target sample is a whole number of respondents' })
    .positive({ error: 'The target sample must be at least 1' })
    .max(1_000_000, { error: 'The target sample must be at most 1,000,000' }),
  priceMinMinor: positiveMinorSchema,
  priceMaxMinor: positiveMinorSchema,
};

function priceRangeCheck(
  value: { priceMinMinor?: number; priceMaxMinor?: number },
  ctx: z.RefinementCtx,
): void {
  const { priceMinMinor: min, priceMaxMinor: max } = value;
  if (min !== undefined && max !== undefined && max <= min) {
    ctx.addIssue({
      code: 'custom',
      path: ['priceMaxMinor'],
      message: 'The highest price must be above the lowest',
    });
  }
}

/** Body of `POST /api/studies`. */
export const studyCreateSchema = z.strictObject(studyFieldsShape).superRefine(priceRangeCheck);
export type StudyCreate = z.infer<typeof studyCreateSchema>;

/**
 * Body of `PATCH /api/studies/:studyId`: any of the fields; `secondProductName: null` removes
 * the second product. The server checks the price range again against the stored values.
 */
export const studyUpdateSchema = z
  .strictObject(studyFieldsShape)
  .partial()
  .superRefine(priceRangeCheck)
  .refine((update) => Object.keys(update).length > 0, { error: 'Change at least one field' });
export type StudyUpdate = z.infer<typeof studyUpdateSchema>;

/** A study as the API returns it, with the roles the caller holds in it. */
export const studySchema = z.object({
  id: z.uuid(),
  name: z.string(),
  productName: z.string(),
  secondProductName: z.string().nullable(),
  currency: z.string(),
  locale: z.string(),
  market: z.string(),
  targetSample: z.number(),
  priceMinMinor: z.number(),
  priceMaxMinor: z.number(),
  status: studyStatusSchema,
  createdAt: z.string(),
  updatedAt: z.string(),
  myRoles: z.array(roleSchema),
});
export type Study = z.infer<typeof studySchema>;
