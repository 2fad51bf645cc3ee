import { Router } from 'express';
import { z } from 'zod';
import { issueApiTokenRequestSchema } from '@shared/analysis/api-token';
import type { AppDependencies } from '../app-dependencies';
import { actorOf } from '../auth/actor';
import { validate } from '../http/validate';
import { issueToken, listOrganisationTokens, listTokens, revokeToken } from './tokens-repository';

/**
 * The client's read-API tokens: issue (shown once), list, revoke; and the admin's view of every
 * token of the organisation, with revoke.
 */
export function tokensRouter(deps: AppDependencies): Router {
  const router = Router();
  const owner = (res: Parameters<typeof actorOf>[0]) => {
    const actor = actorOf(res);
    return { userId: actor.userId, organisationId: actor.organisationId };
  };
  router.post('/portal/tokens', async (req, res) => {
    const request = validate(issueApiTokenRequestSchema, req.body);
    res.status(201).json(await issueToken(deps.db, owner(res), request));
  });
  router.get('/portal/tokens', async (_req, res) => {
    res.json(await listTokens(deps.db, owner(res)));
  });
  router.delete('/portal/tokens/:tokenId', async (req, res) => {
    const tokenId = validate(z.uuid(), req.params.tokenId, 'token id');
    res.json(await revokeToken(deps.db, owner(res), tokenId, 'owner'));
  });
  router.get('/admin/tokens', async (_req, res) => {
    res.json(await listOrganisationTokens(deps.db, actorOf(res).organisationId));
  });
  router.delete('/admin/tokens/:tokenId', async (req, res) => {
    const tokenId = validate(z.uuid(), req.params.tokenId, 'token id');
    const { organisationId } = actorOf(res);
    res.json(await revokeToken(deps.db, { organisationId }, tokenId, 'admin'));
  });
  return router;
}
