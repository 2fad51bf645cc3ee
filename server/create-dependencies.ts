import type { AppDependencies } from './app-dependencies';
import { IdentityProvider } from './auth/identity-provider';
import type { Config } from './config';
import { connectDatabase } from './db/database';
import { createMailer } from './mail/mailer';
import { createObjectStorage } from './storage/object-storage';

/** Connects to every outside part named in the configuration. */
export function createDependencies(config: Config): AppDependencies {
  return {
    config,
    db: connectDatabase(config.DATABASE_URL),
    identity: new IdentityProvider(config),
    mailer: createMailer(config),
    storage: createObjectStorage(config),
  };
}
