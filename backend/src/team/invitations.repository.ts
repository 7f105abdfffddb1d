import { Injectable } from '@nestjs/common';
import { and, desc, eq, gt, isNull } from 'drizzle-orm';
import { DatabaseService, Executor } from '../database/database.service';
import { invitations } from '../database/schema';

export type InvitationRow = typeof invitations.$inferSelect;

@Injectable()
export class InvitationsRepository {
  constructor(private readonly database: DatabaseService) {}

  async insert(values: typeof invitations.$inferInsert, executor: Executor = this.database.db): Promise<InvitationRow> {
    const [row] = await executor.insert(invitations).values(values).returning();
    return row;
  }

  /** The invitation with this token hash, locked until the transaction ends. */
  async findByTokenHashForUpdate(tokenHash: string, executor: Executor): Promise<InvitationRow | undefined> {
    const [row] = await executor.select().from(invitations).where(eq(invitations.tokenHash, tokenHash)).limit(1).for('update');
    return row;
  }

  /** The invitation with this token hash, read without a lock (to tell its holder what it can do). */
  async findByTokenHash(tokenHash: string, executor: Executor = this.database.db): Promise<InvitationRow | undefined> {
    const [row] = await executor.select().from(invitations).where(eq(invitations.tokenHash, tokenHash)).limit(1);
    return row;
  }

  listForProject(projectId: string, executor: Executor = this.database.db): Promise<InvitationRow[]> {
    return executor.select().from(invitations).where(eq(invitations.projectId, projectId)).orderBy(desc(invitations.createdAt));
  }

  /** End the pending invitations of one address to one project (a new one replaces them). */
  async expirePending(projectId: string, email: string, now: Date, executor: Executor): Promise<void> {
    await executor
      .update(invitations)
      .set({ expiresAt: now, updatedAt: now })
      .where(and(eq(invitations.projectId, projectId), eq(invitations.email, email), isNull(invitations.acceptedAt), gt(invitations.expiresAt, now)));
  }

  /** Mark accepted if nobody did so first; false when it was already used. */
  async markAccepted(id: string, now: Date, executor: Executor): Promise<boolean> {
    const rows = await executor
      .update(invitations)
      .set({ acceptedAt: now, updatedAt: now })
      .where(and(eq(invitations.id, id), isNull(invitations.acceptedAt)))
      .returning({ id: invitations.id });
    return rows.length === 1;
  }
}
