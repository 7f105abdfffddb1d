import { Injectable } from '@nestjs/common';
import { createHash } from 'node:crypto';
import type { Pool } from 'pg';
import { RateLimiterPostgres, RateLimiterRes } from 'rate-limiter-flexible';
import { DomainError } from '../common/errors/domain-error';
import { DatabaseService } from '../database/database.service';
import { RateLimitsRepository } from './rate-limits.repository';

/** The table rate-limiter-flexible's PostgreSQL store writes (drizzle migration `rate_limits`). */
const TABLE = 'rate_limits';

/** Failed sign-ins one (e-mail, client) pair gets before delays start [common practice: a handful]. */
export const FREE_FAILURES_PER_PAIR = 5;
/** Longest delay between attempts of one pair, seconds. */
export const MAX_PAIR_DELAY_SECONDS = 15 * 60;
/** How long a pair's failures are remembered from its first one, seconds. */
const PAIR_MEMORY_SECONDS = 60 * 60;
/** Failed sign-ins one client may make, for any addresses, per window: far above one person's typing. */
export const CLIENT_FAILURES_PER_WINDOW = 100;
const CLIENT_WINDOW_SECONDS = 15 * 60;

/** Password-reset requests per address and per client in an hour [common practice]. */
export const RESETS_PER_EMAIL = 5;
export const RESETS_PER_CLIENT = 30;
const RESET_WINDOW_SECONDS = 60 * 60;

/**
 * The delay the n-th consecutive failure of a pair imposes before its next attempt: none for the
 * first FREE_FAILURES_PER_PAIR, then 1 s, 2 s, 4 s ... doubling up to MAX_PAIR_DELAY_SECONDS.
 */
export function pairDelaySeconds(failures: number): number {
  if (failures < FREE_FAILURES_PER_PAIR) return 0;
  return Math.min(2 ** (failures - FREE_FAILURES_PER_PAIR), MAX_PAIR_DELAY_SECONDS);
}

/** An e-mail as it appears in a key: hashed, so the table holds no addresses and keys stay short. */
function emailKey(email: string): string {
  return createHash('sha256').update(email.trim().toLowerCase()).digest('hex').slice(0, 40);
}

function tooMany(what: string, msBeforeNext: number): DomainError {
  const seconds = Math.max(1, Math.ceil(msBeforeNext / 1000));
  const wait = seconds < 120 ? `${seconds} seconds` : `${Math.ceil(seconds / 60)} minutes`;
  return new DomainError('TOO_MANY_REQUESTS', `too many ${what}; try again in ${wait}`, undefined, { retryAfterSeconds: seconds });
}

/**
 * Throttling of sign-in failures and password-reset requests, kept in PostgreSQL so every API
 * replica shares one count (rate-limiter-flexible's PostgreSQL store, which prunes expired rows).
 *
 * Sign-in is throttled per (e-mail, client) with growing delays, never locked: a stranger's
 * failures from elsewhere never refuse the right password from another client. Each client also
 * has a much higher cap on failures for any addresses. A successful sign-in clears its pair; a
 * password reset clears every pair of its address.
 */
@Injectable()
export class AttemptThrottle {
  private readonly pairFailures: RateLimiterPostgres;
  private readonly pairDelays: RateLimiterPostgres;
  private readonly clientFailures: RateLimiterPostgres;
  private readonly resetsPerEmail: RateLimiterPostgres;
  private readonly resetsPerClient: RateLimiterPostgres;

  constructor(
    database: DatabaseService,
    private readonly rateLimits: RateLimitsRepository,
  ) {
    const store = (keyPrefix: string, points: number, duration: number, prune = false) =>
      new RateLimiterPostgres({
        storeClient: database.pool as Pool,
        storeType: 'pool',
        tableName: TABLE,
        tableCreated: true,
        // One limiter prunes the shared table for all (expired an hour ago, every five minutes).
        clearExpiredByTimeout: prune,
        keyPrefix,
        points,
        duration,
      });
    this.pairFailures = store('signin-failures', Number.MAX_SAFE_INTEGER, PAIR_MEMORY_SECONDS, true);
    this.pairDelays = store('signin-delay', 1, MAX_PAIR_DELAY_SECONDS);
    this.clientFailures = store('signin-client', CLIENT_FAILURES_PER_WINDOW, CLIENT_WINDOW_SECONDS);
    this.resetsPerEmail = store('reset-email', RESETS_PER_EMAIL, RESET_WINDOW_SECONDS);
    this.resetsPerClient = store('reset-client', RESETS_PER_CLIENT, RESET_WINDOW_SECONDS);
  }

  private static pair(email: string, client: string): string {
    return `${emailKey(email)}:${client}`;
  }

  /** TOO_MANY_REQUESTS while this pair waits out its delay or the client is over its cap. */
  async checkSignIn(email: string, client: string): Promise<void> {
    const [delay, clientCount] = await Promise.all([this.pairDelays.get(AttemptThrottle.pair(email, client)), this.clientFailures.get(client)]);
    if (delay && delay.consumedPoints > 1) throw tooMany('failed sign-ins for this address', delay.msBeforeNext);
    if (clientCount && clientCount.consumedPoints >= CLIENT_FAILURES_PER_WINDOW) throw tooMany('failed sign-ins from this client', clientCount.msBeforeNext);
  }

  async recordSignInFailure(email: string, client: string): Promise<void> {
    const key = AttemptThrottle.pair(email, client);
    const [failures] = await Promise.all([this.pairFailures.penalty(key, 1), this.clientFailures.penalty(client, 1)]);
    const delay = pairDelaySeconds((failures as RateLimiterRes).consumedPoints);
    if (delay > 0) await this.pairDelays.block(key, delay);
  }

  async recordSignInSuccess(email: string, client: string): Promise<void> {
    const key = AttemptThrottle.pair(email, client);
    await Promise.all([this.pairFailures.delete(key), this.pairDelays.delete(key)]);
  }

  /** Forget every sign-in failure of an address, from any client (after its password was reset). */
  async clearSignIns(email: string): Promise<void> {
    const hashed = emailKey(email);
    await Promise.all([this.rateLimits.deleteByPrefix(`signin-failures:${hashed}:`), this.rateLimits.deleteByPrefix(`signin-delay:${hashed}:`)]);
  }

  /**
   * Count a password-reset request; TOO_MANY_REQUESTS beyond the caps per address and per client.
   * Every request counts, whether or not the address has an account, so the limit reveals nothing.
   */
  async takeResetRequest(email: string, client: string): Promise<void> {
    const [perEmail, perClient] = await Promise.all([this.resetsPerEmail.get(emailKey(email)), this.resetsPerClient.get(client)]);
    for (const [count, cap] of [[perEmail, RESETS_PER_EMAIL], [perClient, RESETS_PER_CLIENT]] as const) {
      if (count && count.consumedPoints >= cap) throw tooMany('password-reset requests', count.msBeforeNext);
    }
    await Promise.all([this.resetsPerEmail.penalty(emailKey(email), 1), this.resetsPerClient.penalty(client, 1)]);
  }
}
