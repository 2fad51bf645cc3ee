import { z } from 'zod';
import { storableText } from '../storable/storable-text';
import { roleSchema, roleSetSchema } from '../auth/role';

/** Body of `POST /api/invitations`. */
export const invitationRequestSchema = z
  .object({
    email: z.string().trim().toLowerCase().email('Enter a valid e-mail address'),
    name: storableText().trim().min(1, 'Enter the person’s name').max(120),
    roles: roleSetSchema,
  })
  .strict();
export type InvitationRequest = z.infer<typeof invitationRequestSchema>;

export const invitationStatuses = ['pending', 'accepted', 'expired'] as const;

/** An invitation as the admin sees it in the list. */
export const invitationSchema = z.object({
  id: z.string().uuid(),
  email: z.string().email(),
  name: z.string(),
  roles: z.array(roleSchema),
  status: z.enum(invitationStatuses),
  createdAt: z.string(),
  expiresAt: z.string(),
});
export type Invitation = z.infer<typeof invitationSchema>;
