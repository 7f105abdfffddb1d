import { describe, expect, it } from 'vitest';
import { AttemptLimiter } from './attempt-limiter';

describe(AttemptLimiter.name, () => {
  it('allows attempts until the failure budget is spent, then asks to wait out the window', () => {
    const limiter = new AttemptLimiter(3, 60_000);
    const keys = ['email:a@b.test', 'ip:127.0.0.1'];
    for (let i = 0; i < 3; i++) {
      expect(limiter.retryAfterSeconds(keys, 1000 + i)).toBe(0);
      limiter.record(keys, 1000 + i);
    }
    expect(limiter.retryAfterSeconds(keys, 2000)).toBe(59);
    expect(limiter.retryAfterSeconds(keys, 61_001)).toBe(0);
  });

  it('limits by any one key, and a success clears that key', () => {
    const limiter = new AttemptLimiter(2, 60_000);
    limiter.record(['email:x', 'ip:1'], 0);
    limiter.record(['email:y', 'ip:1'], 1);
    expect(limiter.retryAfterSeconds(['email:z', 'ip:1'], 2)).toBeGreaterThan(0);
    limiter.recordSuccess(['ip:1']);
    expect(limiter.retryAfterSeconds(['email:z', 'ip:1'], 3)).toBe(0);
  });

  it('keeps each key to its own window', () => {
    const limiter = new AttemptLimiter(1, 1000);
    limiter.record(['email:a'], 0);
    expect(limiter.retryAfterSeconds(['email:a'], 10)).toBe(1);
    expect(limiter.retryAfterSeconds(['email:b'], 10)).toBe(0);
    expect(limiter.retryAfterSeconds(['email:a'], 1000)).toBe(0);
  });
});
