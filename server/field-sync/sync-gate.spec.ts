import express from 'express';
import request from 'supertest';
import { loadConfig } from '../config';
import { syncGate } from './sync-gate';

const baseEnv = {
  APP_URL: 'http://127.0.0.1:9',
  DATABASE_URL: 'postgres://x@127.0.0.1:9/x',
  SESSION_SECRET: 'x'.repeat(32),
  OIDC_ISSUER: 'http://127.0.0.1:9',
  OIDC_CLIENT_ID: 'x',
  OIDC_CLIENT_SECRET: 'x',
  S3_BUCKET: 'x',
  S3_ACCESS_KEY_ID: 'x',
  S3_SECRET_ACCESS_KEY: 'x',
  SMTP_URL: 'smtp://127.0.0.1:9',
};

/** An app whose sync handler waits until the test lets each batch finish. */
function gatedApp(env: Record<string, string>) {
  const release: Array<() => void> = [];
  let entered = 0;
  const app = express();
  app.use('/sync', syncGate(loadConfig({ ...baseEnv, ...env })));
  app.post('/sync', (_req, res) => {
    entered += 1;
    release.push(() => res.json({ ok: true }));
  });
  return { app, release, entered: () => entered };
}

const until = async (check: () => boolean) => {
  for (let i = 0; i < 200 && !check(); i += 1) await new Promise((r) => setTimeout(r, 5));
};

describe('syncGate', () => {
  it('lets SYNC_CONCURRENCY batches in, queues the next, and lets it in when one finishes', async () => {
    const gated = gatedApp({ SYNC_CONCURRENCY: '1', SYNC_QUEUE_LENGTH: '5' });
    const server = gated.app.listen(0);
    try {
      const agent = request(server);
      const first = agent.post('/sync').then((r) => r.status);
      await until(() => gated.entered() === 1);
      const second = agent.post('/sync').then((r) => r.status);
      await new Promise((r) => setTimeout(r, 50));
      expect(gated.entered()).toBe(1);
      gated.release.shift()?.();
      await until(() => gated.entered() === 2);
      gated.release.shift()?.();
      expect(await Promise.all([first, second])).toEqual([200, 200]);
    } finally {
      server.close();
    }
  });

  it('answers 503 with Retry-After once the line is full', async () => {
    const gated = gatedApp({ SYNC_CONCURRENCY: '1', SYNC_QUEUE_LENGTH: '1' });
    const server = gated.app.listen(0);
    try {
      const agent = request(server);
      const first = agent.post('/sync').then((r) => r.status);
      await until(() => gated.entered() === 1);
      const second = agent.post('/sync').then((r) => r.status);
      await new Promise((r) => setTimeout(r, 30));
      const third = await agent.post('/sync');
      expect(third.status).toBe(503);
      expect(third.headers['retry-after']).toBe('2');
      expect(third.body).toMatchObject({ error: { code: 'busy', limit: 'sync-busy' } });
      gated.release.shift()?.();
      await until(() => gated.entered() === 2);
      gated.release.shift()?.();
      expect(await Promise.all([first, second])).toEqual([200, 200]);
    } finally {
      server.close();
    }
  });

  it('answers 503 to a batch that waited longer than SYNC_QUEUE_WAIT_MS', async () => {
    const gated = gatedApp({ SYNC_CONCURRENCY: '1', SYNC_QUEUE_WAIT_MS: '40' });
    const server = gated.app.listen(0);
    try {
      const agent = request(server);
      const first = agent.post('/sync').then((r) => r.status);
      await until(() => gated.entered() === 1);
      const waited = await agent.post('/sync');
      expect(waited.status).toBe(503);
      expect(gated.entered()).toBe(1);
      gated.release.shift()?.();
      expect(await first).toBe(200);
    } finally {
      server.close();
    }
  });
});
