/**
 * Authorization: one permission enum and one role-to-permission table. Services ask for a
 * permission through `AccessService.requireAccess`; no role strings anywhere else.
 */
import { ROLES, type Role } from '../database/schema/enums';

export { ROLES, type Role };

export enum Permission {
  /** Read everything in the project. */
  ProjectRead = 'project.read',
  /** Segments, sites, units, event horizons, samples, imports, attachments. */
  StratigraphyWrite = 'stratigraphy.write',
  /** Start and cancel site age model runs. */
  AgeModelRun = 'age-model.run',
  /** Create, edit and delete correlation hypotheses and ties. */
  CorrelationWrite = 'correlation.write',
  /** Start and cancel recurrence analyses. */
  RecurrenceRun = 'recurrence.run',
  /** Members, roles, invitations. */
  MembersManage = 'members.manage',
  /** Freeze releases. */
  ReleaseCreate = 'release.create',
  /** Read the audit trail. */
  AuditRead = 'audit.read',
  /** Project-wide settings, such as refreshing stale results automatically. */
  ProjectSettings = 'project.settings',
  /** Ask for stale results to be re-run (each kind still needs its own run permission). */
  ResultsRefresh = 'results.refresh',
}

const READ = [Permission.ProjectRead, Permission.AuditRead];

export const ROLE_PERMISSIONS: Record<Role, ReadonlySet<Permission>> = {
  ADMIN: new Set(Object.values(Permission)),
  RESEARCHER: new Set([...READ, Permission.StratigraphyWrite, Permission.AgeModelRun, Permission.ResultsRefresh]),
  CORRELATOR: new Set([...READ, Permission.CorrelationWrite, Permission.ResultsRefresh]),
  ANALYST: new Set([...READ, Permission.RecurrenceRun, Permission.ResultsRefresh]),
  VIEWER: new Set(READ),
};

export function roleAllows(role: Role, permission: Permission): boolean {
  return ROLE_PERMISSIONS[role].has(permission);
}

/**
 * A permission's name in the GraphQL `enum Permission` (`age-model.run` -> `AGE_MODEL_RUN`);
 * `permissions.spec.ts` checks that the schema lists exactly these names.
 */
export function permissionName(permission: Permission): string {
  return permission.toUpperCase().replace(/[.-]/g, '_');
}

/** What a role may do, as GraphQL `Permission` names in the enum's order. */
export function permissionNamesOf(role: Role): string[] {
  return Object.values(Permission)
    .filter((permission) => roleAllows(role, permission))
    .map(permissionName);
}
