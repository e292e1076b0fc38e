import 'server-only';
import { RateLimiterPostgres } from 'rate-limiter-flexible';
import { getSequelize } from '@/lib/db';
import { AppError } from '@/lib/errors';

export interface SignInLimits {
  /** Failed attempts allowed per account within the window. */
  perAccount: number;
  /** Failed attempts allowed per client address within the window. */
  perAddress: number;
  windowSeconds: number;
}

/** Five wrong passwords per account and twenty per address in 15 minutes (common practice). */
export const DEFAULT_SIGN_IN_LIMITS: SignInLimits = { perAccount: 5, perAddress: 20, windowSeconds: 15 * 60 };

export interface SignInLimiter {
  /** Throws `rate_limited:sign_in` when either counter is used up. */
  assertAllowed(key: { email: string; address: string }): Promise<void>;
  recordFailure(key: { email: string; address: string }): Promise<void>;
  recordSuccess(key: { email: string }): Promise<void>;
}

/** Sign-in attempt counters kept in PostgreSQL, so every app process shares them. */
export function createSignInLimiter(limits: SignInLimits = DEFAULT_SIGN_IN_LIMITS, prefix = 'signin'): SignInLimiter {
  const common = { storeClient: getSequelize(), storeType: 'sequelize', tableName: 'rate_limits', tableCreated: true, clearExpiredByTimeout: false, duration: limits.windowSeconds };
  const byAccount = new RateLimiterPostgres({ ...common, keyPrefix: `${prefix}_account`, points: limits.perAccount });
  const byAddress = new RateLimiterPostgres({ ...common, keyPrefix: `${prefix}_address`, points: limits.perAddress });

  return {
    async assertAllowed({ email, address }) {
      const [account, client] = await Promise.all([byAccount.get(email), byAddress.get(address)]);
      const used = [
        account && account.consumedPoints >= limits.perAccount ? account.msBeforeNext : 0,
        client && client.consumedPoints >= limits.perAddress ? client.msBeforeNext : 0,
      ];
      const waitMs = Math.max(...used);
      if (waitMs > 0) {
        const minutes = Math.max(1, Math.ceil(waitMs / 60_000));
        throw new AppError('rate_limited', 'sign_in', `Too many sign-in attempts. Try again in ${minutes} minute${minutes === 1 ? '' : 's'}.`);
      }
    },
    async recordFailure({ email, address }) {
      // penalty() counts without rejecting; the check above decides.
      await Promise.all([byAccount.penalty(email), byAddress.penalty(address)]);
    },
    async recordSuccess({ email }) {
      await byAccount.delete(email);
    },
  };
}

let shared: SignInLimiter | undefined;

export function signInLimiter(): SignInLimiter {
  shared ??= createSignInLimiter();
  return shared;
}
