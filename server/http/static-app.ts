import express, { Router } from 'express';
import { existsSync } from 'node:fs';
import { join } from 'node:path';

/** Files the service worker checks for updates: never cached by the browser's HTTP cache. */
const alwaysFresh = new Set([
  '/index.html',
  '/ngsw.json',
  '/ngsw-worker.js',
  '/safety-worker.js',
  '/manifest.webmanifest',
]);

/** Serves the built Angular app; unknown paths get index.html so client-side routes deep-link. */
export function staticApp(dir: string): Router {
  const router = Router();
  const index = join(dir, 'index.html');
  if (!existsSync(index)) {
    throw new Error(`The built app is missing (${index}); run the build first.`);
  }
  router.use(
    express.static(dir, {
      index: false,
      setHeaders(res, path) {
        const name = path.slice(dir.length);
        res.setHeader(
          'Cache-Control',
          alwaysFresh.has(name)
            ? 'no-cache'
            : /-[A-Z0-9]{8}\./.test(name)
              ? 'public, max-age=31536000, immutable'
              : 'public, max-age=3600',
        );
      },
    }),
  );
  router.get('/{*splat}', (_req, res) => {
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(index);
  });
  return router;
}
