import { describe, expect, it } from 'vitest';
import { ConfigError, loadConfig } from './config';

const BASE = { DATABASE_URL: 'postgres://u@127.0.0.1:5432/db' };

function problemsOf(env: Record<string, string>): string[] {
  try {
    loadConfig({ ...BASE, ...env });
  } catch (error) {
    if (error instanceof ConfigError) return error.problems;
    throw error;
  }
  return [];
}

describe('loadConfig', () => {
  it('reads operators as trimmed lower-case addresses and has none by default', () => {
    expect(loadConfig(BASE).operatorEmails).toEqual([]);
    expect(loadConfig({ ...BASE, OPERATOR_EMAILS: ' Ops@Example.org, second@example.org ,' }).operatorEmails).toEqual(['ops@example.org', 'second@example.org']);
  });

  it('lists every bad variable at once', () => {
    const problems = problemsOf({ OPERATOR_EMAILS: 'not-an-address', LADDER_CACHE_MIB: '-1', PORT: 'x' });
    expect(problems).toHaveLength(3);
    expect(problems.join('\n')).toMatch(/OPERATOR_EMAILS .*"not-an-address"/);
    expect(problems.join('\n')).toMatch(/LADDER_CACHE_MIB/);
    expect(problems.join('\n')).toMatch(/PORT/);
  });

  it('keeps 64 MiB for ladder answers unless told, and 0 turns the cache off', () => {
    expect(loadConfig(BASE).ladderCacheMiB).toBe(64);
    expect(loadConfig({ ...BASE, LADDER_CACHE_MIB: '0' }).ladderCacheMiB).toBe(0);
  });

  it('refuses production without a secret or with the demo seed', () => {
    const problems = problemsOf({ NODE_ENV: 'production', SEED_DEMO: 'true' });
    expect(problems.some((p) => p.startsWith('JWT_SECRET'))).toBe(true);
    expect(problems.some((p) => p.startsWith('SEED_DEMO'))).toBe(true);
  });
});
