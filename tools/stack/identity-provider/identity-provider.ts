import express from 'express';
import { generateKeyPairSync, randomBytes } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import type { Server } from 'node:http';
import { join } from 'node:path';
import Provider, { type Configuration } from 'oidc-provider';
import { AccountStore, type SeedAccount } from './account-store';
import { interactionRoutes } from './interaction-routes';
import {
  defaultWrongPasswordLimits,
  WrongPasswordGuard,
  type WrongPasswordLimits,
} from './wrong-password-limits';

export interface IdentityProviderOptions {
  dir: string;
  port: number;
  clientId: string;
  clientSecret: string;
  redirectUris: string[];
  accounts: readonly SeedAccount[];
  /** Wrong passwords allowed per account and per address in 15 minutes. */
  wrongPasswordLimits?: WrongPasswordLimits;
}

export interface RunningIdentityProvider {
  issuer: string;
  stop(): Promise<void>;
}

/** Signing key and cookie keys are kept on disk so sessions survive a restart of the stack. */
function persistentSecrets(dir: string) {
  const file = join(dir, 'identity-provider-keys.json');
  if (existsSync(file))
    return JSON.parse(readFileSync(file, 'utf8')) as { jwk: object; cookieKeys: string[] };
  const { privateKey } = generateKeyPairSync('rsa', { modulusLength: 2048 });
  const secrets = {
    jwk: {
      ...privateKey.export({ format: 'jwk' }),
      use: 'sig',
      alg: 'RS256',
      kid: randomBytes(8).toString('hex'),
    },
    cookieKeys: [randomBytes(32).toString('hex')],
  };
  writeFileSync(file, JSON.stringify(secrets), { mode: 0o600 });
  return secrets;
}

/**
 * The local stand-in for an OpenID Connect provider, built on oidc-provider: code flow with PKCE
 * required, one confidential client for the app, and Fieldcurve-styled sign-in pages.
 */
export async function startIdentityProvider(
  options: IdentityProviderOptions,
): Promise<RunningIdentityProvider> {
  const issuer = `http://127.0.0.1:${options.port}`;
  const accounts = new AccountStore(join(options.dir, 'identity-provider-accounts.json'));
  accounts.seed(options.accounts);
  const secrets = persistentSecrets(options.dir);
  const configuration: Configuration = {
    clients: [
      {
        client_id: options.clientId,
        client_secret: options.clientSecret,
        redirect_uris: options.redirectUris,
        grant_types: ['authorization_code'],
        response_types: ['code'],
        token_endpoint_auth_method: 'client_secret_basic',
      },
    ],
    jwks: { keys: [secrets.jwk as never] },
    cookies: {
      keys: secrets.cookieKeys,
      names: { session: 'idp.session', interaction: 'idp.interaction', resume: 'idp.resume' },
    },
    pkce: { required: () => true },
    claims: { openid: ['sub'], email: ['email', 'email_verified'], profile: ['name'] },
    // Carry e-mail and name in the ID token itself, so the app needs no userinfo call.
    conformIdTokenClaims: false,
    features: { devInteractions: { enabled: false } },
    interactions: { url: (_ctx, interaction) => `/interaction/${interaction.uid}` },
    findAccount: (_ctx, id) => {
      const account = accounts.findById(id);
      if (!account) return undefined;
      return {
        accountId: account.id,
        claims: () => ({
          sub: account.id,
          email: account.email,
          email_verified: account.emailVerified !== false,
          name: account.name,
        }),
      };
    },
    ttl: {
      AuthorizationCode: 60,
      IdToken: 3600,
      AccessToken: 3600,
      Interaction: 600,
      Session: 8 * 3600,
      Grant: 8 * 3600,
    },
  };
  const provider = new Provider(issuer, configuration);
  const app = express();
  const guard = new WrongPasswordGuard(options.wrongPasswordLimits ?? defaultWrongPasswordLimits);
  app.use('/interaction', interactionRoutes(provider, accounts, guard));
  app.use(provider.callback());
  const server: Server = await new Promise((resolveListen, reject) => {
    const listening = app.listen(options.port, '127.0.0.1', () => resolveListen(listening));
    listening.once('error', reject);
  });
  return {
    issuer,
    stop: () => new Promise((done) => server.close(() => done())),
  };
}
