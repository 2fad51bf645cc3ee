import { Router } from 'express';
import { eq } from 'drizzle-orm';
import { z } from 'zod';
import { memberRolesUpdateSchema } from '@shared/members/member';
import { invitationRequestSchema } from '@shared/members/invitation';
import type { AppDependencies } from '../app-dependencies';
import { actorOf } from '../auth/actor';
import { organisations } from '../db/schema';
import { validate } from '../http/validate';
import { invitationMail } from './invitation-mail';
import { createInvitation, listInvitations } from './invitations-repository';
import { listMembers, setMemberRoles } from './members-repository';

const userIdParams = z.object({ userId: z.uuid('The member id must be a UUID') });

/** Admin-only management of the organisation's people (the access policy enforces the role). */
export function membersRouter({ db, mailer, config }: AppDependencies): Router {
  const router = Router();

  router.get('/members', async (_req, res) => {
    res.json(await listMembers(db, actorOf(res).organisationId));
  });

  router.put('/members/:userId/roles', async (req, res) => {
    const { userId } = validate(userIdParams, req.params, 'path');
    const { roles } = validate(memberRolesUpdateSchema, req.body);
    await setMemberRoles(db, actorOf(res).organisationId, userId, roles);
    res.status(204).end();
  });

  router.get('/invitations', async (_req, res) => {
    res.json(await listInvitations(db, actorOf(res).organisationId));
  });

  router.post('/invitations', async (req, res) => {
    const request = validate(invitationRequestSchema, req.body);
    const actor = actorOf(res);
    // The row and the e-mail succeed together: if the relay refuses, no invitation is left behind.
    const invitation = await db.transaction(async (tx) => {
      const created = await createInvitation(tx, actor.organisationId, actor.userId, request);
      const [organisation] = await tx
        .select({ name: organisations.name })
        .from(organisations)
        .where(eq(organisations.id, actor.organisationId));
      await mailer.send(
        invitationMail({
          to: request.email,
          name: request.name,
          inviterName: actor.name,
          organisationName: organisation?.name ?? 'your organisation',
          roles: request.roles,
          link: new URL(`/auth/invitation/${created.token}`, config.APP_URL).href,
        }),
      );
      return created.invitation;
    });
    res.status(201).json(invitation);
  });

  return router;
}
