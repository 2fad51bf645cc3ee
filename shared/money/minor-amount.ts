import { z } from 'zod';

/** A price or amount in integer minor units of the study's currency, above zero. */
export const positiveMinorSchema = z
  .int({ error: 'Enter an amount' })
  .positive({ error: 'Must be more than zero' })
  .max(Number.MAX_SAFE_INTEGER);

/** An amount in integer minor units that may be zero (a willingness to pay of nothing). */
export const nonNegativeMinorSchema = z
  .int({ error: 'Enter an amount' })
  .nonnegative({ error: 'Must not be negative' })
  .max(Number.MAX_SAFE_INTEGER);
