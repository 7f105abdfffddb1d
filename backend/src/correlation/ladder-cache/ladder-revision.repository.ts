import { Injectable } from '@nestjs/common';
import { sql } from 'drizzle-orm';
import { QueryResult } from 'pg';
import { Role } from '../../access/permissions';
import { DatabaseService } from '../../database/database.service';

/** What the ladder answer cache checks before serving a stored answer. */
export interface LadderCacheState {
  /** The caller's token epoch; null when the user is gone. */
  epoch: number | null;
  /** The caller's role in the project; null when not a member. */
  role: Role | null;
  /** The project's revision ('' when the project has none, e.g. it is gone). */
  revision: string;
}

/** The one query the event-ladder answer cache makes per request. */
@Injectable()
export class LadderRevisionRepository {
  constructor(private readonly database: DatabaseService) {}

  /**
   * The caller's token epoch, role and the project's revision (`project_revisions`, bumped by
   * triggers in the database whenever any of the project's rows changes), in one query.
   */
  async state(userId: string, projectId: string): Promise<LadderCacheState> {
    const result = (await this.database.db.execute(sql`
      select
        (select token_epoch from users where id = ${userId}) as epoch,
        (select role from memberships where project_id = ${projectId} and user_id = ${userId}) as role,
        coalesce((select revision::text from project_revisions where project_id = ${projectId}), '') as revision`)) as unknown as QueryResult<LadderCacheState>;
    return result.rows[0];
  }

  /** The project's revision alone ('' when it has none): what per-process memos of project data compare. */
  async projectRevision(projectId: string): Promise<string> {
    const result = (await this.database.db.execute(sql`
      select revision::text as revision from project_revisions where project_id = ${projectId}`)) as unknown as QueryResult<{ revision: string }>;
    return result.rows[0]?.revision ?? '';
  }
}
