import { RateLimiterMemory, RateLimiterRes } from 'rate-limiter-flexible';

/** Wrong passwords allowed per account and per address in 15 minutes. */
export interface WrongPasswordLimits {
  perAccount: number;
  perAddress: number;
}

export const defaultWrongPasswordLimits: WrongPasswordLimits = { perAccount: 10, perAddress: 50 };

const windowSeconds = 15 * 60;

/**
 * Counts wrong passwords at the local provider, per account and per address. It runs as one
 * process, so its counters live in memory (the app's own limits are in PostgreSQL); a real
 * provider brings its own protection.
 */
export class WrongPasswordGuard {
  private readonly accounts: RateLimiterMemory;
  private readonly addresses: RateLimiterMemory;

  constructor(private readonly limits: WrongPasswordLimits) {
    this.accounts = new RateLimiterMemory({ points: limits.perAccount, duration: windowSeconds });
    this.addresses = new RateLimiterMemory({ points: limits.perAddress, duration: windowSeconds });
  }

  /** Milliseconds until the next attempt is allowed, or 0 when it may go ahead now. */
  async waitBeforeAttempt(email: string, address: string): Promise<number> {
    const [account, from] = await Promise.all([
      this.accounts.get(email.toLowerCase()),
      this.addresses.get(address),
    ]);
    const spent = (res: RateLimiterRes | null, points: number) =>
      res && res.consumedPoints >= points ? res.msBeforeNext : 0;
    return Math.max(spent(account, this.limits.perAccount), spent(from, this.limits.perAddress));
  }

  async wrongPassword(email: string, address: string): Promise<void> {
    await Promise.all([
      this.accounts.penalty(email.toLowerCase()),
      this.addresses.penalty(address),
    ]);
  }

  /** A right password clears the account's count (the address keeps its own). */
  async rightPassword(email: string): Promise<void> {
    await this.accounts.delete(email.toLowerCase());
  }
}
