import { Injectable } from '@nestjs/common';
import { and, eq } from 'drizzle-orm';
import { DatabaseService, Executor } from '../database/database.service';
import { memberships } from '../database/schema';
import { Role } from './permissions';

@Injectable()
export class AccessRepository {
  constructor(private readonly database: DatabaseService) {}

  /** The user's role in the project, or undefined when not a member. */
  async roleOf(userId: string, projectId: string, executor: Executor = this.database.db): Promise<Role | undefined> {
    const [row] = await executor
      .select({ role: memberships.role })
      .from(memberships)
      .where(and(eq(memberships.userId, userId), eq(memberships.projectId, projectId)))
      .limit(1);
    return row?.role;
  }
}
