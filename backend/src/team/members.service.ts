import { Injectable } from '@nestjs/common';
import { AccessService } from '../access/access.service';
import { Permission } from '../access/permissions';
import { AuditService } from '../audit/audit.service';
import { AuthUser } from '../auth/auth-user';
import { badInput, notFound } from '../common/errors/domain-error';
import { DatabaseService } from '../database/database.service';
import { MembershipRow, MembershipsRepository } from './memberships.repository';
import { SetMemberRoleInput } from './dto/set-member-role.input';
import { MembersRepository } from './members.repository';

const LAST_ADMIN = 'a project needs at least one ADMIN: make someone else ADMIN first';

function auditImage(membership: MembershipRow) {
  return { userId: membership.user.id, email: membership.user.email, role: membership.role };
}

/** Roles and removal of project members (ADMIN only); the last ADMIN always stays. */
@Injectable()
export class MembersService {
  constructor(
    private readonly database: DatabaseService,
    private readonly memberships: MembershipsRepository,
    private readonly members: MembersRepository,
    private readonly access: AccessService,
    private readonly audit: AuditService,
  ) {}

  async setRole(user: AuthUser, input: SetMemberRoleInput): Promise<MembershipRow> {
    await this.access.requireAccess({ user, permission: Permission.MembersManage, projectId: input.projectId });
    return this.database.transaction(async (tx) => {
      await this.members.lockProject(input.projectId, tx);
      const current = await this.memberships.find(input.projectId, input.userId, tx);
      if (!current) throw notFound('member');
      if (current.role === input.role) return current;
      if (current.role === 'ADMIN' && (await this.memberships.countAdmins(input.projectId, tx)) <= 1) throw badInput('role', LAST_ADMIN);
      await this.memberships.upsert(input.projectId, input.userId, input.role, tx);
      const updated = (await this.memberships.find(input.projectId, input.userId, tx))!;
      await this.audit.record(tx, {
        actor: user, projectId: input.projectId, action: 'update', objectType: 'membership', objectId: current.id,
        before: auditImage(current), after: auditImage(updated),
      });
      return updated;
    });
  }

  async remove(user: AuthUser, projectId: string, userId: string): Promise<boolean> {
    await this.access.requireAccess({ user, permission: Permission.MembersManage, projectId });
    return this.database.transaction(async (tx) => {
      await this.members.lockProject(projectId, tx);
      const current = await this.memberships.find(projectId, userId, tx);
      if (!current) throw notFound('member');
      if (current.role === 'ADMIN' && (await this.memberships.countAdmins(projectId, tx)) <= 1) throw badInput('userId', LAST_ADMIN);
      await this.memberships.remove(projectId, userId, tx);
      await this.audit.record(tx, {
        actor: user, projectId, action: 'delete', objectType: 'membership', objectId: current.id, before: auditImage(current),
      });
      return true;
    });
  }
}
