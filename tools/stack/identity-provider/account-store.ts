import { randomUUID, scryptSync, timingSafeEqual, randomBytes } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';

export interface Account {
  id: string;
  email: string;
  name: string;
  passwordHash: string;
  /** Whether the address was confirmed; absent means confirmed (the usual account). */
  emailVerified?: boolean;
}

/** An account the provider starts with. */
export interface SeedAccount {
  email: string;
  name: string;
  password: string;
  emailVerified?: boolean;
}

function hashPassword(password: string, salt = randomBytes(16).toString('hex')): string {
  return `${salt}:${scryptSync(password, salt, 32).toString('hex')}`;
}

function passwordMatches(password: string, stored: string): boolean {
  const [salt, expected] = stored.split(':');
  if (!salt || !expected) return false;
  const actual = scryptSync(password, salt, 32);
  return timingSafeEqual(actual, Buffer.from(expected, 'hex'));
}

/**
 * The local provider's accounts, kept in a JSON file so they survive a restart. A real provider
 * replaces all of this; Fieldcurve only ever sees the ID token's subject, e-mail and name.
 */
export class AccountStore {
  private accounts: Account[];

  constructor(private readonly file: string) {
    this.accounts = existsSync(file) ? (JSON.parse(readFileSync(file, 'utf8')) as Account[]) : [];
  }

  findById(id: string): Account | undefined {
    return this.accounts.find((a) => a.id === id);
  }

  findByEmail(email: string): Account | undefined {
    return this.accounts.find((a) => a.email === email.trim().toLowerCase());
  }

  verify(email: string, password: string): Account | undefined {
    const account = this.findByEmail(email);
    return account && passwordMatches(password, account.passwordHash) ? account : undefined;
  }

  /** Creates an account, or returns undefined when the e-mail is taken. */
  create(email: string, name: string, password: string): Account | undefined {
    if (this.findByEmail(email)) return undefined;
    const account = {
      id: randomUUID(),
      email: email.trim().toLowerCase(),
      name: name.trim(),
      passwordHash: hashPassword(password),
    };
    this.accounts.push(account);
    writeFileSync(this.file, JSON.stringify(this.accounts, null, 2));
    return account;
  }

  /** Makes sure each seeded account exists (used for the demo organisation's people). */
  seed(seeds: readonly SeedAccount[]): void {
    for (const seedAccount of seeds) {
      const account = this.create(seedAccount.email, seedAccount.name, seedAccount.password);
      if (account && seedAccount.emailVerified === false) {
        account.emailVerified = false;
        writeFileSync(this.file, JSON.stringify(this.accounts, null, 2));
      }
    }
  }
}
