import { z } from 'zod';
import { storableText } from '../storable/storable-text';

/** Longest and default life of a read-API token, in days (chosen at issue). */
export const maxTokenLifetimeDays = 365;
export const defaultTokenLifetimeDays = 90;

/** Why a token stopped working before its expiry. */
export const tokenRevocationReasons = [
  'owner',
  'admin',
  'role-removed',
  'member-deactivated',
] as const;
export type TokenRevocationReason = (typeof tokenRevocationReasons)[number];

/** An access token as its owner sees it in the portal (never the token itself after issue). */
export const apiTokenSchema = z.object({
  id: z.uuid(),
  name: z.string(),
  /** The first characters of the token, to tell tokens apart. */
  prefix: z.string(),
  createdAt: z.iso.datetime({ offset: true }),
  lastUsedAt: z.iso.datetime({ offset: true }).nullable(),
  revokedAt: z.iso.datetime({ offset: true }).nullable(),
  revokedReason: z.enum(tokenRevocationReasons).nullable(),
  expiresAt: z.iso.datetime({ offset: true }),
  /** The studies the token is restricted to; null when it reaches all of the owner's studies. */
  studyIds: z.array(z.uuid()).nullable(),
});
export type ApiToken = z.infer<typeof apiTokenSchema>;

/** A token as the organisation's admin sees it: with its owner. */
export const organisationApiTokenSchema = apiTokenSchema.extend({
  ownerName: z.string(),
  ownerEmail: z.string(),
});
export type OrganisationApiToken = z.infer<typeof organisationApiTokenSchema>;

/** The answer to issuing a token: the secret is shown this once. */
export const issuedApiTokenSchema = apiTokenSchema.extend({ token: z.string() });
export type IssuedApiToken = z.infer<typeof issuedApiTokenSchema>;

/** The body of POST /api/portal/tokens. */
export const issueApiTokenRequestSchema = z.strictObject({
  // One line of printable text: control characters would garble every list that shows it.
  name: storableText()
    .trim()
    .min(1, 'Name the token (e.g. the tool that uses it)')
    .max(100, 'Keep the name to 100 characters')
    .refine(
      (text) => ![...text].some((c) => c.charCodeAt(0) < 0x20 || c.charCodeAt(0) === 0x7f),
      'The name cannot contain control characters',
    ),
  expiresInDays: z
    .number({ error: 'Give the lifetime in days' })
    .int('Give the lifetime in whole days')
    .min(1, 'A token lives at least 1 day')
    .max(maxTokenLifetimeDays, `A token lives at most ${maxTokenLifetimeDays} days`)
    .default(defaultTokenLifetimeDays),
  /** Restrict the token to these of the owner's studies; leave out for all of them. */
  studyIds: z
    .array(z.uuid('A study id must be a UUID'))
    .min(1, 'Choose at least one study, or leave the restriction out')
    .max(100, 'Choose at most 100 studies')
    .refine((ids) => new Set(ids).size === ids.length, 'A study is listed twice')
    .optional(),
});
export type IssueApiTokenRequest = z.input<typeof issueApiTokenRequestSchema>;
