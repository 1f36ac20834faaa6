import type { Pool } from 'mysql2';
import { RateLimiterMySQL, RateLimiterRes } from 'rate-limiter-flexible';
import type { Config } from '../../config';
import { tooManyRequests } from '../../http/errors';

type Limiter = RateLimiterMySQL;

function minutesText(seconds: number): string {
  const minutes = Math.max(1, Math.ceil(seconds / 60));
  return minutes === 1 ? '1 minute' : `${minutes} minutes`;
}

/**
 * Counters kept in MariaDB (shared by every app server): failed sign-ins per account and per
 * address, and e-mail-sending requests (sign-up, reset, resend) per account and per address.
 * The address is the socket's unless a proxy count is configured, so a forged
 * X-Forwarded-For header does not reset anything.
 */
export class RateLimits {
  private readonly signInByAccount: Limiter;
  private readonly signInByAddress: Limiter;
  private readonly mailByAccount: Limiter;
  private readonly mailByAddress: Limiter;
  private readonly plannerByAddress: Limiter;

  constructor(pool: Pool, config: Config) {
    const common = {
      storeClient: pool,
      storeType: 'pool',
      dbName: config.db.database,
      tableName: 'rate_limits',
      tableCreated: true,
    };
    const window = config.signInLimits.windowMinutes * 60;
    const ns = config.rateLimitNamespace;
    this.signInByAccount = new RateLimiterMySQL({
      ...common,
      keyPrefix: `${ns}:signin:acct`,
      points: config.signInLimits.perAccount,
      duration: window,
    });
    this.signInByAddress = new RateLimiterMySQL({
      ...common,
      keyPrefix: `${ns}:signin:addr`,
      points: config.signInLimits.perAddress,
      duration: window,
    });
    this.mailByAccount = new RateLimiterMySQL({ ...common, keyPrefix: `${ns}:mail:acct`, points: 3, duration: 3600 });
    this.mailByAddress = new RateLimiterMySQL({
      ...common,
      keyPrefix: `${ns}:mail:addr`,
      points: config.signInLimits.perAddress,
      duration: 3600,
    });
    this.plannerByAddress = new RateLimiterMySQL({
      ...common,
      keyPrefix: `${ns}:planner:addr`,
      points: config.plannerLimitPerMinute,
      duration: 60,
    });
  }

  /** Refuse a sign-in attempt while either counter is used up. */
  async assertSignInAllowed(email: string, address: string): Promise<void> {
    const [byAccount, byAddress] = await Promise.all([
      this.signInByAccount.get(email),
      this.signInByAddress.get(address),
    ]);
    const blocked = [byAccount, byAddress].filter(
      (res, i): res is RateLimiterRes =>
        res !== null && res.consumedPoints >= (i === 0 ? this.signInByAccount.points : this.signInByAddress.points),
    );
    if (blocked.length) {
      const wait = Math.ceil(Math.max(...blocked.map((r) => r.msBeforeNext)) / 1000);
      throw tooManyRequests(
        wait,
        `Too many failed sign-in attempts. Try again in ${minutesText(wait)}, or reset your password.`,
      );
    }
  }

  async recordSignInFailure(email: string, address: string): Promise<void> {
    await Promise.all([consumeQuietly(this.signInByAccount, email), consumeQuietly(this.signInByAddress, address)]);
  }

  async clearSignInFailures(email: string): Promise<void> {
    await this.signInByAccount.delete(email);
  }

  /** The public planner: an allowance per address per minute, so one client cannot hog the server. */
  async consumePlannerRequest(address: string): Promise<void> {
    await consumeOrRefuse(this.plannerByAddress, address, 'Too many plans computed from your address.');
  }

  /** Count a request that sends e-mail; refuse it once the hour's allowance is used. */
  async consumeMailRequest(email: string, address: string): Promise<void> {
    try {
      await Promise.all([this.mailByAccount.consume(email), this.mailByAddress.consume(address)]);
    } catch (error) {
      if (!(error instanceof RateLimiterRes)) throw error;
      const wait = Math.ceil(error.msBeforeNext / 1000);
      throw tooManyRequests(wait, `Too many requests for e-mails. Try again in ${minutesText(wait)}.`);
    }
  }
}

async function consumeOrRefuse(limiter: Limiter, key: string, what: string): Promise<void> {
  try {
    await limiter.consume(key);
  } catch (error) {
    if (!(error instanceof RateLimiterRes)) throw error;
    const wait = Math.ceil(error.msBeforeNext / 1000);
    throw tooManyRequests(wait, `${what} Try again in ${minutesText(wait)}.`);
  }
}

async function consumeQuietly(limiter: Limiter, key: string): Promise<void> {
  try {
    await limiter.consume(key);
  } catch (error) {
    if (!(error instanceof RateLimiterRes)) throw error;
  }
}
