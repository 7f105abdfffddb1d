import { Injectable } from '@nestjs/common';
import { desc, eq, sql } from 'drizzle-orm';
import { DatabaseService, Executor } from '../database/database.service';
import { releases, users } from '../database/schema';
import { ProjectBundle } from '../exchange/bundle-format';

export type ReleaseRow = Omit<typeof releases.$inferSelect, 'snapshot'> & { snapshot: ProjectBundle };
export type UserRow = typeof users.$inferSelect;

/** Releases are written once and never updated: this repository has no update or delete. */
@Injectable()
export class ReleasesRepository {
  constructor(private readonly database: DatabaseService) {}

  async findById(id: string, executor: Executor = this.database.db): Promise<ReleaseRow | undefined> {
    const [row] = await executor.select().from(releases).where(eq(releases.id, id)).limit(1);
    return row as ReleaseRow | undefined;
  }

  async listForProject(projectId: string, executor: Executor = this.database.db): Promise<ReleaseRow[]> {
    const rows = await executor.select().from(releases).where(eq(releases.projectId, projectId)).orderBy(desc(releases.number));
    return rows as ReleaseRow[];
  }

  async nextNumber(projectId: string, executor: Executor): Promise<number> {
    const [row] = await executor
      .select({ next: sql<number>`coalesce(max(${releases.number}), 0) + 1` })
      .from(releases)
      .where(eq(releases.projectId, projectId));
    return Number(row.next);
  }

  async insert(values: Omit<typeof releases.$inferInsert, 'snapshot'> & { snapshot: ProjectBundle }, executor: Executor): Promise<ReleaseRow> {
    const [row] = await executor.insert(releases).values(values).returning();
    return row as ReleaseRow;
  }

  async findUser(id: string, executor: Executor = this.database.db): Promise<UserRow | undefined> {
    const [row] = await executor.select().from(users).where(eq(users.id, id)).limit(1);
    return row;
  }
}
