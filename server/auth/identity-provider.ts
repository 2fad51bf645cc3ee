import * as oidc from 'openid-client';
import type { Config } from '../config';

/** The OpenID Connect relying-party side: discovery once, then code flow with PKCE. */
export class IdentityProvider {
  private configuration?: Promise<oidc.Configuration>;

  constructor(private readonly config: Config) {}

  /** Discovers the provider on first use (it may start after the app) and retries after a failure. */
  discover(): Promise<oidc.Configuration> {
    this.configuration ??= oidc
      .discovery(
        new URL(this.config.OIDC_ISSUER),
        this.config.OIDC_CLIENT_ID,
        this.config.OIDC_CLIENT_SECRET,
        undefined,
        this.config.OIDC_ALLOW_HTTP ? { execute: [oidc.allowInsecureRequests] } : undefined,
      )
      .catch((error: unknown) => {
        this.configuration = undefined;
        throw error;
      });
    return this.configuration;
  }

  get redirectUri(): string {
    return new URL('/auth/callback', this.config.APP_URL).href;
  }

  async authorizationUrl(
    pending: { state: string; nonce: string; codeVerifier: string },
    loginHint?: string,
  ) {
    const configuration = await this.discover();
    const parameters: Record<string, string> = {
      redirect_uri: this.redirectUri,
      scope: 'openid email profile',
      code_challenge: await oidc.calculatePKCECodeChallenge(pending.codeVerifier),
      code_challenge_method: 'S256',
      state: pending.state,
      nonce: pending.nonce,
      // Field devices are shared: always ask who is signing in rather than reuse a provider session.
      prompt: 'login',
    };
    if (loginHint) parameters['login_hint'] = loginHint;
    return oidc.buildAuthorizationUrl(configuration, parameters);
  }

  /** Exchanges the callback's code; throws when state, nonce or PKCE do not match. */
  async completeSignIn(
    callbackUrl: URL,
    pending: { state: string; nonce: string; codeVerifier: string },
  ) {
    const configuration = await this.discover();
    const tokens = await oidc.authorizationCodeGrant(configuration, callbackUrl, {
      pkceCodeVerifier: pending.codeVerifier,
      expectedState: pending.state,
      expectedNonce: pending.nonce,
      idTokenExpected: true,
    });
    const claims = tokens.claims();
    if (!claims) throw new Error('The identity provider sent no ID token.');
    return {
      issuer: claims.iss,
      subject: claims.sub,
      email: typeof claims['email'] === 'string' ? claims['email'].toLowerCase() : '',
      name: typeof claims['name'] === 'string' ? claims['name'] : '',
      // Only the provider's explicit `true` counts: an address nobody confirmed names nobody.
      emailVerified: claims['email_verified'] === true,
    };
  }

  static newPendingSignIn(returnTo: string) {
    return {
      state: oidc.randomState(),
      nonce: oidc.randomNonce(),
      codeVerifier: oidc.randomPKCECodeVerifier(),
      returnTo,
    };
  }
}
