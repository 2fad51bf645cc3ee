import { Router } from 'express';
import { eq } from 'drizzle-orm';
import { z } from 'zod';
import { memberRolesUpdateSchema } from '@shared/members/member';
import { invitationRequestSchema } from '@shared/members/invitation';
import type { AppDependencies } from '../app-dependencies';
import { actorOf } from '../auth/actor';
import { organisations } from '../db/schema';
import { HttpError, notFound } from '../http/http-error';
import { validate } from '../http/validate';
import { refuseUnneededInvitation } from './invitation-conflicts';
import { invitationMail } from './invitation-mail';
import { createInvitation, listInvitations, withdrawInvitation } from './invitations-repository';
import { listMembers, setMemberRoles } from './members-repository';
import { deactivateMember, reactivateMember } from './member-lifecycle';

const userIdParams = z.object({ userId: z.uuid('The member id must be a UUID') });
const invitationIdParams = z.object({
  invitationId: z.uuid('The invitation id must be a UUID'),
});

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

  router.post('/members/:userId/deactivate', async (req, res) => {
    const { userId } = validate(userIdParams, req.params, 'path');
    const actor = actorOf(res);
    await deactivateMember(db, actor.organisationId, userId, actor.userId);
    res.status(204).end();
  });

  router.post('/members/:userId/reactivate', async (req, res) => {
    const { userId } = validate(userIdParams, req.params, 'path');
    await reactivateMember(db, actorOf(res).organisationId, userId);
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
      // 'No key update' lets other rows keep referring to the organisation meanwhile, but makes
      // two admins inviting at once take turns, so the second sees the first's invitation.
      const [organisation] = await tx
        .select({ name: organisations.name })
        .from(organisations)
        .where(eq(organisations.id, actor.organisationId))
        .for('no key update');
      await refuseUnneededInvitation(tx, actor.organisationId, request.email);
      const created = await createInvitation(tx, actor.organisationId, actor.userId, request);
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

  router.delete('/invitations/:invitationId', async (req, res) => {
    const { invitationId } = validate(invitationIdParams, req.params, 'path');
    const outcome = await withdrawInvitation(db, actorOf(res).organisationId, invitationId);
    if (outcome === 'missing') throw notFound('That invitation');
    if (outcome === 'accepted') {
      throw new HttpError(
        409,
        'invitation-accepted',
        'That invitation has been accepted already. Change the person’s roles in the list of people instead.',
      );
    }
    res.status(204).end();
  });

  return router;
}
