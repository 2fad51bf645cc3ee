import { z } from 'zod';
import { unstorableTextReason } from './unstorable-text';

/**
 * A string the database can store, for every free-text field of the API: refuses NUL and lone
 * surrogates with a message the field's issue carries. Chain `.trim().min().max()` as usual.
 */
export function storableText(params?: { error?: string }) {
  return z.string(params).superRefine((text, ctx) => {
    const reason = unstorableTextReason(text);
    if (reason) ctx.addIssue({ code: 'custom', message: reason, input: text });
  });
}
