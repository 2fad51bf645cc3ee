import { z } from 'zod';

/** One problem with one field of a request; `path` is the field's location, e.g. `roles.0`. */
export const fieldIssueSchema = z.object({
  path: z.string(),
  message: z.string(),
});
export type FieldIssue = z.infer<typeof fieldIssueSchema>;

/** The JSON body of every error response the API sends. */
export const apiErrorSchema = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    issues: z.array(fieldIssueSchema).optional(),
    /** On a 429 or 503: which limit was reached (the `Retry-After` header says when to retry). */
    limit: z.string().optional(),
  }),
});
export type ApiError = z.infer<typeof apiErrorSchema>;
