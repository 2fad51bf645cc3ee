import type { z } from 'zod';
import { HttpError } from './http-error';

/**
 * Parses request input with a shared zod schema; on failure answers 400 listing every field and
 * what is wrong with it, so the client can show each message beside its field. The summary
 * message is those field messages themselves: a form shows it as it stands, with no word of
 * bodies or paths.
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
  const sentences = parsed.error.issues.map((issue) =>
    // A bare value (an id in the address) has no field to name; say which value it is.
    issue.path.length === 0 && where !== 'body'
      ? `The ${where} is not valid.`
      : asSentence(issue.message),
  );
  throw new HttpError(400, 'invalid-input', [...new Set(sentences)].join(' '), issues);
}

function asSentence(text: string): string {
  const trimmed = text.trim();
  const end = /[.!?]$/.test(trimmed) ? '' : '.';
  return `${trimmed.charAt(0).toUpperCase()}${trimmed.slice(1)}${end}`;
}
