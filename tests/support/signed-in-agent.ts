import { randomBytes, randomUUID } from 'node:crypto';
import signature from 'cookie-signature';
import request from 'supertest';
import type { Express } from 'express';
import type { Database } from '../../server/db/database';
import { sessions } from '../../server/db/schema';
import { sessionCookieName } from '../../server/http/session-middleware';

export interface SignedInAgent {
  cookie: string;
  csrfToken: string;
  get(path: string): request.Test;
  delete(path: string): request.Test;
  post(path: string, body?: object): request.Test;
  put(path: string, body?: object): request.Test;
  patch(path: string, body?: object): request.Test;
}

/**
 * A supertest client holding a real session row, as the sign-in callback would have written it.
 * The full OpenID Connect flow is tested on its own (sign-in.test.ts); the other API tests start
 * from its result so they stay fast.
 */
export async function signedInAgent(
  app: Express,
  db: Database,
  secret: string,
  who: { userId: string; organisationId: string },
): Promise<SignedInAgent> {
  const sid = randomUUID();
  const csrfToken = randomBytes(32).toString('base64url');
  const expire = new Date(Date.now() + 60 * 60 * 1000);
  await db.insert(sessions).values({
    sid,
    expire,
    sess: {
      cookie: { originalMaxAge: 3600000, expires: expire.toISOString(), httpOnly: true, path: '/' },
      ...who,
      csrfToken,
    },
  });
  const cookie = `${sessionCookieName}=${encodeURIComponent(`s:${signature.sign(sid, secret)}`)}`;
  const withBody = (test: request.Test, body?: object) =>
    (body === undefined ? test : test.send(body))
      .set('Cookie', cookie)
      .set('x-csrf-token', csrfToken);
  return {
    cookie,
    csrfToken,
    get: (path) => request(app).get(path).set('Cookie', cookie),
    delete: (path) => withBody(request(app).delete(path)),
    post: (path, body) => withBody(request(app).post(path), body),
    put: (path, body) => withBody(request(app).put(path), body),
    patch: (path, body) => withBody(request(app).patch(path), body),
  };
}
