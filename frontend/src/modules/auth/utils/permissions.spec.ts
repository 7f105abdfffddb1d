import { describe, expect, it } from 'vitest';
import { roleAllows } from './permissions';

// The expected table is the brief's rule (ADMIN and RESEARCHER write stratigraphy and samples)
// and the server's ROLE_PERMISSIONS in backend/src/access/permissions.ts.

describe(roleAllows.name, () => {
  it('lets admins and researchers write stratigraphy and no one else', () => {
    expect(roleAllows('ADMIN', 'stratigraphy.write')).toBe(true);
    expect(roleAllows('RESEARCHER', 'stratigraphy.write')).toBe(true);
    expect(roleAllows('CORRELATOR', 'stratigraphy.write')).toBe(false);
    expect(roleAllows('ANALYST', 'stratigraphy.write')).toBe(false);
    expect(roleAllows('VIEWER', 'stratigraphy.write')).toBe(false);
  });

  it('gives each specialist role its own work only', () => {
    expect(roleAllows('CORRELATOR', 'correlation.write')).toBe(true);
    expect(roleAllows('ANALYST', 'recurrence.run')).toBe(true);
    expect(roleAllows('RESEARCHER', 'members.manage')).toBe(false);
    expect(roleAllows('ADMIN', 'members.manage')).toBe(true);
  });
});
