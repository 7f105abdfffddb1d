import { describe, expect, it } from 'vitest';
import { RunCache } from './run-cache';

describe(RunCache.name, () => {
  it('drops the least recently used run when full', () => {
    const cache = new RunCache<number>(2);
    cache.set('a', 1);
    cache.set('b', 2);
    expect(cache.get('a')).toBe(1); // a is now the most recent
    cache.set('c', 3);
    expect(cache.get('b')).toBeUndefined();
    expect(cache.get('a')).toBe(1);
    expect(cache.get('c')).toBe(3);
    expect(cache.size).toBe(2);
  });

  it('replaces a value stored twice without growing', () => {
    const cache = new RunCache<string>(3);
    cache.set('a', 'old');
    cache.set('a', 'new');
    expect(cache.get('a')).toBe('new');
    expect(cache.size).toBe(1);
  });

  it('refuses a capacity below one', () => {
    expect(() => new RunCache(0)).toThrow(RangeError);
  });
});
