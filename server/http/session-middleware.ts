import connectPgSimple from 'connect-pg-simple';
import session from 'express-session';
import type { Config } from '../config';
import type { Database } from '../db/database';

/** The app's own cookie name: the local identity provider on another port shares the host's cookies. */
export const sessionCookieName = 'fieldcurve.sid';

/** Server-side sessions in PostgreSQL; the browser holds only a signed, httpOnly id. */
export function sessionMiddleware(config: Config, db: Database) {
  const PgStore = connectPgSimple(session);
  return session({
    name: sessionCookieName,
    secret: config.SESSION_SECRET,
    store: new PgStore({ pool: db.$client, tableName: 'sessions', createTableIfMissing: false }),
    resave: false,
    saveUninitialized: false,
    rolling: true,
    cookie: {
      httpOnly: true,
      // Lax, not strict: the identity provider's redirect back to /auth/callback must carry it.
      sameSite: 'lax',
      secure: config.APP_URL.startsWith('https:'),
      maxAge: 12 * 60 * 60 * 1000,
    },
  });
}
