import { Injectable } from '@nestjs/common';
import { asc, eq } from 'drizzle-orm';
import { DatabaseService, Executor } from '../database/database.service';
import { memberships, projects } from '../database/schema';

export type ProjectRow = typeof projects.$inferSelect;

@Injectable()
export class ProjectsRepository {
  constructor(private readonly database: DatabaseService) {}

  async findById(id: string, executor: Executor = this.database.db): Promise<ProjectRow | undefined> {
    const [row] = await executor.select().from(projects).where(eq(projects.id, id)).limit(1);
    return row;
  }

  async listForMember(userId: string, executor: Executor = this.database.db): Promise<ProjectRow[]> {
    const rows = await executor
      .select({ project: projects })
      .from(projects)
      .innerJoin(memberships, eq(memberships.projectId, projects.id))
      .where(eq(memberships.userId, userId))
      .orderBy(asc(projects.name));
    return rows.map((r) => r.project);
  }

  /** The first member of a new project, its ADMIN. */
  async insertFounder(projectId: string, userId: string, executor: Executor = this.database.db): Promise<void> {
    await executor.insert(memberships).values({ projectId, userId, role: 'ADMIN' });
  }

  async insert(values: typeof projects.$inferInsert, executor: Executor = this.database.db): Promise<ProjectRow> {
    const [row] = await executor.insert(projects).values(values).returning();
    return row;
  }
}
