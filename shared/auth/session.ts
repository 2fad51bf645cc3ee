import { z } from 'zod';
import { roleSchema } from './role';

/** What the signed-in browser learns about itself from `GET /api/session`. */
export const sessionInfoSchema = z.object({
  user: z.object({
    id: z.string().uuid(),
    email: z.string().email(),
    name: z.string(),
  }),
  organisation: z.object({
    id: z.string().uuid(),
    name: z.string(),
  }),
  roles: z.array(roleSchema),
  /** Echoed back in the `x-csrf-token` header of every state-changing request. */
  csrfToken: z.string().min(16),
});
export type SessionInfo = z.infer<typeof sessionInfoSchema>;

export { csrfHeaderName } from './csrf-header';
