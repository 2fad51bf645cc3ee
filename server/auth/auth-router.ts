import { Router, type Request } from 'express';
import { and, ne } from 'drizzle-orm';
import { z } from 'zod';
import type { SessionInfo } from '@shared/auth/session';
import type { AppDependencies } from '../app-dependencies';
import { actorOf } from './actor';
import { endSessions, sessionsOf } from './ended-session';
import { csrfTokenFor, requireCsrfToken } from './csrf';
import { IdentityProvider } from './identity-provider';
import { resolveSignIn } from './sign-in-resolution';
import { signInProblemCss, signInProblemPage } from './sign-in-problem-page';
import { sessionCookieName } from '../http/session-middleware';
import { sessions } from '../db/schema';
import { findOpenInvitation } from '../members/invitations-repository';
import { hashInvitationToken } from '../members/invitation-token';

/** Only same-site paths may be returned to after sign-in (no open redirect). */
const returnToSchema = z
  .string()
  .regex(/^\/(?![/\\])[^\s]*$/)
  .catch('/');

function regenerate(req: Request): Promise<void> {
  return new Promise((resolve, reject) =>
    req.session.regenerate((error: unknown) =>
      error
        ? reject(error instanceof Error ? error : new Error('The session could not be renewed'))
        : resolve(),
    ),
  );
}

/** Browser-facing sign-in, callback, invitation links and sign-out. */
export function authRouter({ db, identity }: AppDependencies): Router {
  const router = Router();

  router.get('/problem.css', (_req, res) => {
    res.type('text/css').send(signInProblemCss);
  });

  router.get('/sign-in', async (req, res) => {
    const returnTo = returnToSchema.parse(req.query['returnTo']);
    const pending = IdentityProvider.newPendingSignIn(returnTo);
    req.session.pendingSignIn = pending;
    const hint = typeof req.query['email'] === 'string' ? req.query['email'] : undefined;
    res.redirect((await identity.authorizationUrl(pending, hint)).href);
  });

  router.get('/invitation/:token', async (req, res) => {
    const invitation = await findOpenInvitation(db, hashInvitationToken(req.params.token));
    if (!invitation) {
      res
        .status(410)
        .send(
          signInProblemPage(
            'This invitation cannot be used',
            'It has already been accepted or withdrawn, or it has expired. Ask your administrator to send a new one.',
          ),
        );
      return;
    }
    await regenerate(req);
    req.session.invitationToken = req.params.token;
    const pending = IdentityProvider.newPendingSignIn('/');
    req.session.pendingSignIn = pending;
    res.redirect((await identity.authorizationUrl(pending, invitation.email)).href);
  });

  router.get('/callback', async (req, res) => {
    const pending = req.session.pendingSignIn;
    const invitationToken = req.session.invitationToken;
    if (!pending) {
      res
        .status(400)
        .send(
          signInProblemPage(
            'This sign-in has expired',
            'The answer from the sign-in service was already used or belongs to another browser window. Please sign in again.',
          ),
        );
      return;
    }
    delete req.session.pendingSignIn;
    let who;
    try {
      who = await identity.completeSignIn(new URL(req.originalUrl, identity.redirectUri), pending);
    } catch (error) {
      const reason = error instanceof Error ? error.message : String(error);
      res
        .status(400)
        .send(
          signInProblemPage(
            'Sign-in could not be completed',
            `The sign-in service's answer was refused (${reason}). Please sign in again.`,
          ),
        );
      return;
    }
    if (!who.emailVerified) {
      req.session.destroy(() => undefined);
      res
        .status(403)
        .send(
          signInProblemPage(
            'Confirm your e-mail address first',
            `The sign-in service has not confirmed that ${who.email} is yours. Confirm the address with the sign-in service (look for its message in your inbox), then sign in again.`,
          ),
        );
      return;
    }
    const outcome = await resolveSignIn(db, who, invitationToken);
    if (outcome.kind !== 'member') {
      req.session.destroy(() => undefined);
      const message =
        outcome.kind === 'invitation-other-email'
          ? `The invitation was sent to ${outcome.invitedEmail}, but you signed in as ${who.email}. Sign in with the invited address.`
          : outcome.kind === 'invitation-invalid'
            ? 'The invitation has already been accepted or withdrawn, or it has expired.'
            : outcome.kind === 'deactivated'
              ? `The access of ${who.email} to this organisation has been deactivated by an administrator. Ask them to reactivate it if you need it again.`
              : `${who.email} is not a member of any Fieldcurve organisation yet. Ask an administrator for an invitation.`;
      const title = outcome.kind === 'deactivated' ? 'Access deactivated' : 'No access yet';
      res.status(403).send(signInProblemPage(title, message));
      return;
    }
    // A new session id after sign-in, so an id planted before sign-in is worthless.
    await regenerate(req);
    req.session.userId = outcome.userId;
    req.session.organisationId = outcome.organisationId;
    csrfTokenFor(req);
    res.redirect(pending.returnTo);
  });

  router.post('/sign-out', requireCsrfToken, async (req, res) => {
    await new Promise<void>((resolve) => req.session.destroy(() => resolve()));
    res.clearCookie(sessionCookieName);
    res.status(204).end();
  });

  return router;
}

/**
 * `GET /api/session`: who the browser is signed in as, with the CSRF token to echo; and signing
 * out on every device.
 */
export function sessionRouter({ db }: Pick<AppDependencies, 'db'>): Router {
  const router = Router();
  // Ends every other session of the person in this organisation: a phone left signed in
  // somewhere stops working at its next call and says why. The browser asking then signs out
  // itself the usual way (POST /auth/sign-out), which the app does right after.
  router.post('/session/sign-out-everywhere', async (req, res) => {
    const actor = actorOf(res);
    const ended = await endSessions(
      db,
      and(sessionsOf(actor.userId, actor.organisationId), ne(sessions.sid, req.sessionID))!,
      'signed-out-everywhere',
    );
    res.json({ endedSessions: ended });
  });
  router.get('/session', (req, res) => {
    const actor = actorOf(res);
    const body: SessionInfo = {
      user: { id: actor.userId, email: actor.email, name: actor.name },
      organisation: { id: actor.organisationId, name: actor.organisationName },
      roles: actor.roles,
      csrfToken: csrfTokenFor(req),
    };
    res.json(body);
  });
  return router;
}
