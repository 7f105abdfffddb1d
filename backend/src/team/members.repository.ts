import { Injectable } from '@nestjs/common';
import { eq } from 'drizzle-orm';
import { Executor } from '../database/database.service';
import { projects } from '../database/schema';

@Injectable()
export class MembersRepository {
  /**
   * Lock the project row for the rest of the transaction, so two admins changing roles at once
   * are serialised and cannot both conclude someone else remains ADMIN.
   */
  async lockProject(projectId: string, executor: Executor): Promise<boolean> {
    const rows = await executor.select({ id: projects.id }).from(projects).where(eq(projects.id, projectId)).for('update');
    return rows.length === 1;
  }
}
