import { Injectable } from '@nestjs/common';
import { DomainError, forbidden } from '../common/errors/domain-error';
import { AuthUser } from '../auth/auth-user';
import { AccessRepository } from './access.repository';
import { Permission, Role, roleAllows } from './permissions';

export interface AccessRequest {
  user: AuthUser;
  permission: Permission;
  projectId: string;
  /** What to call the object in a NOT_FOUND message ("site", "sample"). */
  objectName?: string;
}

@Injectable()
export class AccessService {
  /**
   * Role lookups still waiting for the database, by user and project. A request's parallel fields
   * (the ladder and `project`, then `myRole` and `myPermissions`) ask the same question at once
   * and share one read; an answered lookup is dropped at once, so nothing is kept between reads
   * and a field that runs after a change (a later mutation field) reads again.
   */
  private readonly pending = new Map<string, Promise<Role | undefined>>();

  constructor(private readonly access: AccessRepository) {}

  /**
   * Check that the user may do `permission` in the project. A non-member gets NOT_FOUND, never
   * FORBIDDEN, so the existence of another project's objects is not revealed.
   */
  async requireAccess({ user, permission, projectId, objectName = 'project' }: AccessRequest): Promise<Role> {
    const role = await this.lookUp(user.id, projectId);
    if (!role) throw new DomainError('NOT_FOUND', `${objectName} not found`);
    if (!roleAllows(role, permission)) {
      throw forbidden(`the ${role} role cannot ${describe(permission)} in this project`);
    }
    return role;
  }

  /** The caller's role, or undefined when not a member. */
  roleOf(user: AuthUser, projectId: string): Promise<Role | undefined> {
    return this.lookUp(user.id, projectId);
  }

  private lookUp(userId: string, projectId: string): Promise<Role | undefined> {
    const key = `${userId} ${projectId}`;
    let lookup = this.pending.get(key);
    if (!lookup) {
      lookup = this.access.roleOf(userId, projectId).finally(() => this.pending.delete(key));
      this.pending.set(key, lookup);
    }
    return lookup;
  }
}

function describe(permission: Permission): string {
  switch (permission) {
    case Permission.ProjectRead:
      return 'read data';
    case Permission.StratigraphyWrite:
      return 'change sites, units, event horizons or samples';
    case Permission.AgeModelRun:
      return 'run age models';
    case Permission.CorrelationWrite:
      return 'change correlation hypotheses';
    case Permission.RecurrenceRun:
      return 'run recurrence analyses';
    case Permission.MembersManage:
      return 'manage members';
    case Permission.ReleaseCreate:
      return 'create releases';
    case Permission.AuditRead:
      return 'read the audit trail';
    case Permission.ProjectSettings:
      return 'change project settings';
    case Permission.ResultsRefresh:
      return 'refresh stale results';
  }
}
