import { describe, expect, it } from 'vitest';
import { allows } from './permissions';

describe(allows.name, () => {
  it('allows what the server listed for the caller and nothing else', () => {
    const project = { myPermissions: ['PROJECT_READ', 'STRATIGRAPHY_WRITE'] as const };
    expect(allows(project, 'STRATIGRAPHY_WRITE')).toBe(true);
    expect(allows(project, 'CORRELATION_WRITE')).toBe(false);
    expect(allows(project, 'MEMBERS_MANAGE')).toBe(false);
  });

  it('allows nothing before the project is loaded', () => {
    expect(allows(undefined, 'PROJECT_READ')).toBe(false);
    expect(allows(null, 'PROJECT_READ')).toBe(false);
  });
});
