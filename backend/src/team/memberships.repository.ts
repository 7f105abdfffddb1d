import { Injectable } from '@nestjs/common';
import { and, asc, eq, inArray } from 'drizzle-orm';
import { DatabaseService, Executor } from '../database/database.service';
import { memberships, projects, users } from '../database/schema';
import { Role } from '../access/permissions';

export interface MembershipRow {
  id: string;
  role: Role;
  user: typeof users.$inferSelect;
  project: typeof projects.$inferSelect;
}

@Injectable()
export class MembershipsRepository {
  constructor(private readonly database: DatabaseService) {}

  private joined(executor: Executor) {
    return executor
      .select({ id: memberships.id, role: memberships.role, user: users, project: projects })
      .from(memberships)
      .innerJoin(users, eq(users.id, memberships.userId))
      .innerJoin(projects, eq(projects.id, memberships.projectId));
  }

  listForUser(userId: string, executor: Executor = this.database.db): Promise<MembershipRow[]> {
    return this.joined(executor).where(eq(memberships.userId, userId)).orderBy(asc(projects.name));
  }

  listForProject(projectId: string, executor: Executor = this.database.db): Promise<MembershipRow[]> {
    return this.joined(executor).where(eq(memberships.projectId, projectId)).orderBy(asc(users.email));
  }

  listForUserInProjects(userId: string, projectIds: string[], executor: Executor = this.database.db) {
    if (projectIds.length === 0) return Promise.resolve([]);
    return this.joined(executor).where(and(eq(memberships.userId, userId), inArray(memberships.projectId, projectIds)));
  }

  async find(projectId: string, userId: string, executor: Executor = this.database.db): Promise<MembershipRow | undefined> {
    const [row] = await this.joined(executor).where(
      and(eq(memberships.projectId, projectId), eq(memberships.userId, userId)),
    );
    return row;
  }

  async upsert(projectId: string, userId: string, role: Role, executor: Executor = this.database.db): Promise<void> {
    await executor
      .insert(memberships)
      .values({ projectId, userId, role })
      .onConflictDoUpdate({ target: [memberships.projectId, memberships.userId], set: { role, updatedAt: new Date() } });
  }

  async remove(projectId: string, userId: string, executor: Executor = this.database.db): Promise<number> {
    const rows = await executor
      .delete(memberships)
      .where(and(eq(memberships.projectId, projectId), eq(memberships.userId, userId)))
      .returning({ id: memberships.id });
    return rows.length;
  }

  async countAdmins(projectId: string, executor: Executor = this.database.db): Promise<number> {
    const rows = await executor
      .select({ id: memberships.id })
      .from(memberships)
      .where(and(eq(memberships.projectId, projectId), eq(memberships.role, 'ADMIN')));
    return rows.length;
  }
}
