import { z } from 'zod';
import { storableText } from '../storable/storable-text';

/** An access token as its owner sees it in the portal (never the token itself after issue). */
export const apiTokenSchema = z.object({
  id: z.uuid(),
  name: z.string(),
  /** The first characters of the token, to tell tokens apart. */
  prefix: z.string(),
  createdAt: z.iso.datetime({ offset: true }),
  lastUsedAt: z.iso.datetime({ offset: true }).nullable(),
  revokedAt: z.iso.datetime({ offset: true }).nullable(),
});
export type ApiToken = z.infer<typeof apiTokenSchema>;

/** The answer to issuing a token: the secret is shown this once. */
export const issuedApiTokenSchema = apiTokenSchema.extend({ token: z.string() });
export type IssuedApiToken = z.infer<typeof issuedApiTokenSchema>;

/** The body of POST /api/portal/tokens. */
export const issueApiTokenRequestSchema = z.strictObject({
  name: storableText().trim().min(1, 'Name the token (e.g. the tool that uses it)').max(100),
});
