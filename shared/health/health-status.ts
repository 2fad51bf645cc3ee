import { z } from 'zod';

/**
 * Body of the public `GET /api/health`: whether every outside dependency answers, and nothing
 * more (versions, bucket and addresses are for admins, in `GET /api/health/details`).
 */
export const healthStatusSchema = z.strictObject({ status: z.enum(['ok', 'degraded']) });
export type HealthStatus = z.infer<typeof healthStatusSchema>;
