import { z } from 'zod';

export const dependencyNames = ['database', 'objectStore', 'mail', 'identityProvider'] as const;

const dependencyCheckSchema = z.object({
  ok: z.boolean(),
  /** Milliseconds the probe took. */
  latencyMs: z.number(),
  detail: z.string(),
});

/** Body of `GET /api/health`: one probe per outside dependency. */
export const healthReportSchema = z.object({
  status: z.enum(['ok', 'degraded']),
  checks: z.record(z.enum(dependencyNames), dependencyCheckSchema),
});
export type HealthReport = z.infer<typeof healthReportSchema>;
