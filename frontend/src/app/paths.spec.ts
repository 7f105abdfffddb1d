import { describe, expect, it } from 'vitest';
import { afterSignInPath, paths, routeIdsWellFormed } from './paths';

describe('paths', () => {
  it('builds links from ids, escaping them', () => {
    expect(paths.site('p1', 's 2')).toBe('/projects/p1/sites/s%202');
    expect(paths.site('p1', 's2', 'samples')).toBe('/projects/p1/sites/s2?tab=samples');
    expect(paths.site('p1', 's2', 'column')).toBe('/projects/p1/sites/s2');
  });

  it('remembers where to return after sign-in', () => {
    expect(paths.signIn({ next: '/projects/p1' })).toBe('/signin?next=%2Fprojects%2Fp1');
    expect(paths.signIn({ next: '/signin' })).toBe('/signin');
  });
});

describe(afterSignInPath.name, () => {
  it('follows only paths inside the app', () => {
    expect(afterSignInPath('/projects/p1')).toBe('/projects/p1');
    expect(afterSignInPath('//elsewhere.example')).toBe('/projects');
    expect(afterSignInPath('https://elsewhere.example')).toBe('/projects');
    expect(afterSignInPath(null)).toBe('/projects');
  });
});

describe(routeIdsWellFormed.name, () => {
  it('accepts record ids and refuses any other id parameter', () => {
    const id = '0b6f2f5e-7d1a-4c1e-9a55-2f4b8d7e9c10';
    expect(routeIdsWellFormed({ projectId: id, siteId: id.toUpperCase() })).toBe(true);
    expect(routeIdsWellFormed({ projectId: 'does-not-exist' })).toBe(false);
    expect(routeIdsWellFormed({ projectId: id, siteId: `${id}x` })).toBe(false);
    expect(routeIdsWellFormed({ tab: 'samples' })).toBe(true);
  });
});
