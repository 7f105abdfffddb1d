import type { Role } from '@/gql/graphql';

/**
 * What a member may change, by role: the same table as the server's
 * (backend/src/access/permissions.ts). The screen uses it only to hide or disable controls;
 * the server checks every request itself.
 */
export type ProjectPermission =
  | 'stratigraphy.write'
  | 'age-model.run'
  | 'correlation.write'
  | 'recurrence.run'
  | 'members.manage'
  | 'release.create';

const ROLE_PERMISSIONS: Record<Role, ReadonlySet<ProjectPermission>> = {
  ADMIN: new Set<ProjectPermission>([
    'stratigraphy.write',
    'age-model.run',
    'correlation.write',
    'recurrence.run',
    'members.manage',
    'release.create',
  ]),
  RESEARCHER: new Set<ProjectPermission>(['stratigraphy.write', 'age-model.run']),
  CORRELATOR: new Set<ProjectPermission>(['correlation.write']),
  ANALYST: new Set<ProjectPermission>(['recurrence.run']),
  VIEWER: new Set<ProjectPermission>(),
};

/** Whether a role may do something in a project. */
export function roleAllows(role: Role, permission: ProjectPermission): boolean {
  return ROLE_PERMISSIONS[role].has(permission);
}

/** Role names as people read them. */
export const ROLE_LABELS: Record<Role, string> = {
  ADMIN: 'Admin',
  RESEARCHER: 'Researcher',
  CORRELATOR: 'Correlator',
  ANALYST: 'Hazard analyst',
  VIEWER: 'Viewer',
};
