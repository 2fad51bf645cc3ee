import { z } from 'zod';

/** Respondent characteristics a researcher can rake to. */
export const rakingVariables = ['income-band', 'region', 'household-size'] as const;
export type RakingVariable = (typeof rakingVariables)[number];

export const rakingVariableLabels: Readonly<Record<RakingVariable, string>> = {
  'income-band': 'Income band',
  region: 'Region',
  'household-size': 'Household size',
};

/** The level a respondent without an answer to the variable falls in. */
export const notStatedLevel = 'not-stated';

/** Household sizes are raked in groups, as population figures are usually published. */
export function householdSizeGroup(people: number): string {
  if (people <= 2) return '1-2';
  if (people <= 4) return '3-4';
  if (people <= 6) return '5-6';
  return '7+';
}

/** One population margin: the share (or total) of each level of one variable. */
export const rakingMarginSchema = z.strictObject({
  variable: z.enum(rakingVariables, { error: 'Choose income band, region or household size' }),
  targets: z
    .record(
      z.string().trim().min(1, 'A level needs a name'),
      z
        .number({ error: 'A target is a number' })
        .finite()
        .nonnegative('A target cannot be negative'),
    )
    .refine((targets) => Object.keys(targets).length >= 2, {
      error: 'Give targets for at least two levels',
    }),
});
export type RakingMargin = z.infer<typeof rakingMarginSchema>;

/**
 * Raking to population margins the researcher enters (income-band values as in the
 * questionnaire, region = the points' stratum, household size in the groups of
 * `householdSizeGroup`); respondents without an answer fall in `not-stated`.
 */
export const weightingSpecSchema = z
  .strictObject({
    margins: z.array(rakingMarginSchema).min(1, 'Give at least one margin').max(3),
    maxIterations: z.int().min(1).max(1000).optional(),
  })
  .refine((w) => new Set(w.margins.map((m) => m.variable)).size === w.margins.length, {
    error: 'Each variable may have one margin only',
    path: ['margins'],
  });
export type WeightingSpec = z.infer<typeof weightingSpecSchema>;
