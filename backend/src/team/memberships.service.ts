import { Injectable } from '@nestjs/common';
import { AuthUser } from '../auth/auth-user';
import { MembershipRow, MembershipsRepository } from './memberships.repository';

export type MembershipView = MembershipRow;

@Injectable()
export class MembershipsService {
  constructor(private readonly memberships: MembershipsRepository) {}

  /**
   * Memberships of `userId` that the caller may see: all of their own, and for someone else only
   * those in projects the caller is also a member of.
   */
  async visibleMembershipsOf(userId: string, caller: AuthUser): Promise<MembershipView[]> {
    if (userId === caller.id) return this.memberships.listForUser(userId);
    const mine = await this.memberships.listForUser(caller.id);
    return this.memberships.listForUserInProjects(
      userId,
      mine.map((m) => m.project.id),
    );
  }

  listForProject(projectId: string): Promise<MembershipView[]> {
    return this.memberships.listForProject(projectId);
  }
}
