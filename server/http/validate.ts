import type { z } from 'zod';
import { HttpError } from './http-error';

/**
 * Parses request input with a shared zod schema; on failure answers 400 listing every field and
 * what is wrong with it, so the client can show each message beside its field.
 */
export function validate<T extends z.ZodType>(
  schema: T,
  input: unknown,
  where = 'body',
): z.infer<T> {
  const parsed = schema.safeParse(input);
  if (parsed.success) return parsed.data;
  const issues = parsed.error.issues.map((issue) => ({
    path: issue.path.map(String).join('.') || where,
    message: issue.message,
  }));
  const summary = issues.map((i) => `${i.path}: ${i.message}`).join('; ');
  throw new HttpError(400, 'invalid-input', `The ${where} is not valid — ${summary}`, issues);
}
