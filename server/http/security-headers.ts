import helmet from 'helmet';
import type { Config } from '../config';

/**
 * Security headers with a content security policy the built app runs under: scripts only from
 * our origin; inline styles allowed because Angular components inject their styles at run time.
 */
export function securityHeaders(config: Config) {
  const secure = config.APP_URL.startsWith('https:');
  return helmet({
    contentSecurityPolicy: {
      useDefaults: false,
      directives: {
        defaultSrc: ["'self'"],
        scriptSrc: ["'self'"],
        styleSrc: ["'self'", "'unsafe-inline'"],
        // Review screens load interview photos through the API, never from the object store.
        imgSrc: ["'self'", 'data:', 'blob:'],
        fontSrc: ["'self'"],
        connectSrc: ["'self'"],
        workerSrc: ["'self'"],
        manifestSrc: ["'self'"],
        objectSrc: ["'none'"],
        baseUri: ["'self'"],
        frameAncestors: ["'none'"],
        formAction: ["'self'", new URL(config.OIDC_ISSUER).origin],
        ...(secure ? { upgradeInsecureRequests: [] } : {}),
      },
    },
    strictTransportSecurity: secure,
    crossOriginEmbedderPolicy: false,
  });
}
