import express, { Router, type Request, type Response } from 'express';
import type Provider from 'oidc-provider';
import type { AccountStore } from './account-store';
import { createAccountPage, problemPage, signInPage } from './sign-in-pages';
import type { WrongPasswordGuard } from './wrong-password-limits';

const form = express.urlencoded({ extended: false, limit: '4kb' });

/** Grants exactly the scopes and claims the app asked for: there is no third party to consent to. */
async function finishWithGrant(provider: Provider, req: Request, res: Response, accountId: string) {
  const details = await provider.interactionDetails(req, res);
  const grant = new provider.Grant({ accountId, clientId: param(details.params, 'client_id') });
  grant.addOIDCScope(param(details.params, 'scope') || 'openid');
  const grantId = await grant.save();
  await provider.interactionFinished(
    req,
    res,
    { login: { accountId }, consent: { grantId } },
    { mergeWithLastSubmission: false },
  );
}

/** A request parameter of the interaction as text (absent or non-text parameters become ''). */
function param(params: Record<string, unknown>, name: string): string {
  const value = params[name];
  return typeof value === 'string' ? value : '';
}

function field(req: Request, name: string): string {
  const value: unknown = (req.body as Record<string, unknown> | undefined)?.[name];
  return typeof value === 'string' ? value.trim() : '';
}

/** Sign-in and account creation screens of the local provider. */
export function interactionRoutes(
  provider: Provider,
  accounts: AccountStore,
  guard: WrongPasswordGuard,
): Router {
  const router = Router();
  const noStore = (_req: Request, res: Response, next: () => void) => {
    res.set('cache-control', 'no-store');
    next();
  };
  router.use(noStore);

  router.get('/:uid', async (req, res) => {
    try {
      const details = await provider.interactionDetails(req, res);
      if (details.prompt.name === 'consent' && details.session?.accountId) {
        await finishWithGrant(provider, req, res, details.session.accountId);
        return;
      }
      res.type('html').send(signInPage(details.uid, param(details.params, 'login_hint')));
    } catch {
      res.status(400).type('html').send(problemPage('This sign-in request has expired.'));
    }
  });

  router.post('/:uid/sign-in', form, async (req, res) => {
    const email = field(req, 'email');
    const address = req.ip ?? 'unknown';
    const waitMs = await guard.waitBeforeAttempt(email, address);
    if (waitMs > 0) {
      const minutes = Math.ceil(waitMs / 60_000);
      res
        .status(429)
        .set('Retry-After', String(Math.ceil(waitMs / 1000)))
        .type('html')
        .send(
          signInPage(
            req.params.uid,
            email,
            `Too many wrong passwords for this account or from this address. Try again in ${minutes} min.`,
          ),
        );
      return;
    }
    const account = accounts.verify(email, field(req, 'password'));
    if (!account) {
      await guard.wrongPassword(email, address);
      res
        .status(401)
        .type('html')
        .send(
          signInPage(req.params.uid, email, 'That e-mail and password do not match an account.'),
        );
      return;
    }
    await guard.rightPassword(email);
    await finishWithGrant(provider, req, res, account.id);
  });

  router.get('/:uid/create-account', async (req, res) => {
    const details = await provider.interactionDetails(req, res).catch(() => undefined);
    if (!details) {
      res.status(400).type('html').send(problemPage('This sign-in request has expired.'));
      return;
    }
    res.type('html').send(createAccountPage(details.uid, param(details.params, 'login_hint')));
  });

  router.post('/:uid/create-account', form, async (req, res) => {
    const [name, email, password] = [
      field(req, 'name'),
      field(req, 'email'),
      field(req, 'password'),
    ];
    const problem = !name
      ? 'Enter your name.'
      : !/^[^@\s]+@[^@\s]+\.[^@\s]+$/.test(email)
        ? 'Enter a valid e-mail address.'
        : password.length < 10
          ? 'Choose a password of at least 10 characters.'
          : undefined;
    const account = problem ? undefined : accounts.create(email, name, password);
    if (!account) {
      const message = problem ?? 'An account with that e-mail already exists; sign in instead.';
      res
        .status(400)
        .type('html')
        .send(createAccountPage(req.params.uid, email, message));
      return;
    }
    await finishWithGrant(provider, req, res, account.id);
  });

  return router;
}
