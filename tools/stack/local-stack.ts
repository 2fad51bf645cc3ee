import { randomBytes } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { demoPassword, demoPeople } from '../../server/demo/demo-people';
import { unconfirmedAccount } from './identity-provider/unconfirmed-account';
import { startIdentityProvider } from './identity-provider/identity-provider';
import { startMailSink } from './mail-sink/mail-sink';
import { startObjectStore } from './object-store';
import { startPostgres } from './postgres-cluster';

export interface StackPorts {
  app: number;
  postgres: number;
  identityProvider: number;
  objectStore: number;
  smtp: number;
  mailInbox: number;
}

export interface LocalStack {
  /** Environment for the server process: only configuration differs from production. */
  env: Record<string, string>;
  mailInboxUrl: string;
  stop(): Promise<void>;
}

function localSecret(dir: string): string {
  const file = join(dir, 'session-secret');
  if (!existsSync(file)) writeFileSync(file, randomBytes(32).toString('hex'), { mode: 0o600 });
  return readFileSync(file, 'utf8');
}

/** Rate limits no test run reaches; the rate-limit tests build an app with low ones. */
const generousRateLimits: Record<string, string> = {
  RATE_SIGN_IN_PER_ADDRESS: '1000000',
  RATE_TOKEN_FAILURES_PER_ADDRESS: '1000000',
  RATE_SYNC_PER_USER: '1000000',
  RATE_WRITES_PER_USER: '1000000',
};

/** Starts PostgreSQL and the stand-ins; each step says what failed if it cannot start. */
export async function startLocalStack(
  dir: string,
  ports: StackPorts,
  database: string,
  freshDatabase = false,
  /** For test runs: limits far above anything the tests do (the rate-limit tests set their own). */
  generousLimits = false,
): Promise<LocalStack> {
  const stoppers: (() => Promise<void> | void)[] = [];
  const stop = async () => {
    for (const stopOne of stoppers.reverse())
      await Promise.resolve(stopOne()).catch(() => undefined);
  };
  const step = async <T>(name: string, start: () => Promise<T>): Promise<T> => {
    try {
      return await start();
    } catch (error) {
      await stop();
      throw new Error(
        `${name} could not start: ${error instanceof Error ? error.message : String(error)}`,
      );
    }
  };
  const appUrl = `http://127.0.0.1:${ports.app}`;
  const clientSecret = 'local-client-secret';
  const postgres = await step('PostgreSQL', () =>
    startPostgres({ dir, port: ports.postgres, database, fresh: freshDatabase }),
  );
  stoppers.push(() => postgres.stop());
  const mail = await step('The mail sink', () => startMailSink(ports.smtp, ports.mailInbox));
  stoppers.push(() => mail.stop());
  const store = await step('The object store (s3rver)', () =>
    startObjectStore(dir, ports.objectStore),
  );
  stoppers.push(() => store.stop());
  const accounts = [
    ...demoPeople.map((p) => ({ email: p.email, name: p.name, password: demoPassword })),
    unconfirmedAccount,
  ];
  const idp = await step('The identity provider', () =>
    startIdentityProvider({
      dir,
      port: ports.identityProvider,
      clientId: 'fieldcurve-web',
      clientSecret,
      redirectUris: [`${appUrl}/auth/callback`],
      accounts,
      wrongPasswordLimits: generousLimits ? { perAccount: 10_000, perAddress: 10_000 } : undefined,
    }),
  );
  stoppers.push(() => idp.stop());
  return {
    env: {
      HOST: '127.0.0.1',
      PORT: String(ports.app),
      APP_URL: appUrl,
      DATABASE_URL: postgres.url,
      SESSION_SECRET: localSecret(dir),
      OIDC_ISSUER: idp.issuer,
      OIDC_CLIENT_ID: 'fieldcurve-web',
      OIDC_CLIENT_SECRET: clientSecret,
      OIDC_ALLOW_HTTP: 'true',
      S3_ENDPOINT: store.endpoint,
      S3_BUCKET: store.bucket,
      S3_ACCESS_KEY_ID: store.accessKeyId,
      S3_SECRET_ACCESS_KEY: store.secretAccessKey,
      S3_FORCE_PATH_STYLE: 'true',
      SMTP_URL: `smtp://127.0.0.1:${ports.smtp}`,
      MAIL_SINK_URL: `http://127.0.0.1:${ports.mailInbox}`,
      // The lockfile pins the S3 client; its notice that later releases will need a newer Node
      // than the supported one is printed by every process and asks nothing of this stack.
      AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED: 'true',
      ...(generousLimits ? generousRateLimits : {}),
    },
    mailInboxUrl: `http://127.0.0.1:${ports.mailInbox}`,
    stop,
  };
}
