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
        // Review screens show interview photos through presigned links to the object store.
        imgSrc: ["'self'", 'data:', 'blob:', objectStoreOrigin(config)],
        fontSrc: ["'self'"],
        // The service worker fetches every request a page makes, photos included, and its
        // fetches answer to connect-src: without the object store here, photos came back 504.
        connectSrc: ["'self'", objectStoreOrigin(config)],
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

/** The origin presigned photo links point at: the configured endpoint, or the bucket on AWS. */
function objectStoreOrigin(config: Config): string {
  if (config.S3_ENDPOINT) return new URL(config.S3_ENDPOINT).origin;
  return `https://${config.S3_BUCKET}.s3.${config.S3_REGION}.amazonaws.com`;
}
