import { describe, expect, it } from 'vitest';
import { FREE_FAILURES_PER_PAIR, MAX_PAIR_DELAY_SECONDS, pairDelaySeconds } from './attempt-throttle';

describe(pairDelaySeconds.name, () => {
  it('lets the first failures through, then doubles the wait from one second up to the cap', () => {
    expect(Array.from({ length: FREE_FAILURES_PER_PAIR }, (_, i) => pairDelaySeconds(i))).toEqual([0, 0, 0, 0, 0]);
    expect([5, 6, 7, 8].map(pairDelaySeconds)).toEqual([1, 2, 4, 8]);
    expect(pairDelaySeconds(15)).toBe(MAX_PAIR_DELAY_SECONDS);
    expect(pairDelaySeconds(1_000)).toBe(MAX_PAIR_DELAY_SECONDS);
  });
});
