/**
 * Rate limiting of attempts (failed sign-ins, password-reset requests): after `maxFailures`
 * recorded attempts for one key (an e-mail, a client address) within `windowMs`, further attempts
 * are refused until the window has passed. Kept in process memory: each API replica limits on its
 * own, which bounds attempts to maxFailures x replicas per window [common practice: a few
 * attempts per quarter hour].
 */
export class AttemptLimiter {
  private readonly failures = new Map<string, number[]>();

  constructor(
    readonly maxFailures = 10,
    readonly windowMs = 15 * 60_000,
  ) {}

  /** Seconds until `keys` may try again, or 0 when allowed now. */
  retryAfterSeconds(keys: string[], now = Date.now()): number {
    let wait = 0;
    for (const key of keys) {
      const recent = this.recent(key, now);
      if (recent.length >= this.maxFailures) wait = Math.max(wait, Math.ceil((recent[0] + this.windowMs - now) / 1000));
    }
    return wait;
  }

  record(keys: string[], now = Date.now()): void {
    for (const key of keys) this.failures.set(key, [...this.recent(key, now), now]);
  }

  recordSuccess(keys: string[]): void {
    for (const key of keys) this.failures.delete(key);
  }

  private recent(key: string, now: number): number[] {
    return (this.failures.get(key) ?? []).filter((at) => at > now - this.windowMs);
  }
}
