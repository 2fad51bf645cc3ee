import { availableParallelism } from 'node:os';
import { z } from 'zod';
import { rateLimitConfig } from './http/rate-limit-config';

const flag = z
  .enum(['true', 'false', '1', '0'])
  .optional()
  .transform((value) => value === 'true' || value === '1');

/**
 * Everything that differs between a developer's machine and production comes from the
 * environment; the local stack sets these for its stand-ins (see README, "Configuration").
 */
const configSchema = z.object({
  HOST: z.string().default('127.0.0.1'),
  PORT: z.coerce.number().int().min(0).max(65535).default(4400),
  /** Web server processes sharing the port (one per core by default; see server/main.ts). */
  WEB_PROCESSES: z.coerce.number().int().min(1).max(64).default(availableParallelism()),
  APP_URL: z.url(),
  STATIC_DIR: z.string().optional(),
  DATABASE_URL: z.string().startsWith('postgres'),
  SESSION_SECRET: z.string().min(32, 'SESSION_SECRET must be at least 32 characters'),
  OIDC_ISSUER: z.url(),
  OIDC_CLIENT_ID: z.string().min(1),
  OIDC_CLIENT_SECRET: z.string().min(1),
  /** Only for the local provider: openid-client refuses plain-http issuers otherwise. */
  OIDC_ALLOW_HTTP: flag,
  S3_ENDPOINT: z.url().optional(),
  S3_REGION: z.string().default('us-east-1'),
  S3_BUCKET: z.string().min(1),
  S3_ACCESS_KEY_ID: z.string().min(1),
  S3_SECRET_ACCESS_KEY: z.string().min(1),
  S3_FORCE_PATH_STYLE: flag,
  SMTP_URL: z.string().startsWith('smtp'),
  MAIL_FROM: z.string().default('Fieldcurve <no-reply@fieldcurve.test>'),
  ...rateLimitConfig,
});

export type Config = z.infer<typeof configSchema>;

/** Reads and checks the environment once; a missing or malformed variable stops start-up. */
export function loadConfig(env: NodeJS.ProcessEnv = process.env): Config {
  const parsed = configSchema.safeParse(env);
  if (!parsed.success) {
    const problems = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new Error(`Configuration is incomplete:\n${problems.join('\n')}`);
  }
  return parsed.data;
}
