import type { Permission, Role } from '@/gql/graphql';

/** A project as the screens read it: what the signed-in member may do there, from the server. */
export interface WithPermissions {
  myPermissions: readonly Permission[];
}

/**
 * Whether the signed-in member may do something in a project, read from `Project.myPermissions`
 * (the server's role table applied to the caller). The screen uses it only to hide or disable
 * controls; the server checks every request itself. False while the project is not loaded.
 */
export function allows(project: WithPermissions | null | undefined, permission: Permission): boolean {
  return project?.myPermissions.includes(permission) ?? false;
}

/** Role names as people read them. */
export const ROLE_LABELS: Record<Role, string> = {
  ADMIN: 'Admin',
  RESEARCHER: 'Researcher',
  CORRELATOR: 'Correlator',
  ANALYST: 'Hazard analyst',
  VIEWER: 'Viewer',
};
