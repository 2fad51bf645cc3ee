import type { Config } from './config';
import type { Database } from './db/database';
import type { IdentityProvider } from './auth/identity-provider';
import type { Mailer } from './mail/mailer';
import type { ObjectStorage } from './storage/object-storage';

/** The outside parts every router may use; tests build the same set against the stand-ins. */
export interface AppDependencies {
  config: Config;
  db: Database;
  identity: IdentityProvider;
  mailer: Mailer;
  storage: ObjectStorage;
}
