import { Injectable } from '@nestjs/common';
import { and, eq, gt, isNull } from 'drizzle-orm';
import { DatabaseService, Executor } from '../database/database.service';
import { passwordResets } from '../database/schema';

export type PasswordResetRow = typeof passwordResets.$inferSelect;

@Injectable()
export class PasswordResetsRepository {
  constructor(private readonly database: DatabaseService) {}

  async insert(values: typeof passwordResets.$inferInsert, executor: Executor = this.database.db): Promise<PasswordResetRow> {
    const [row] = await executor.insert(passwordResets).values(values).returning();
    return row;
  }

  /** The reset with this token hash, locked until the transaction ends. */
  async findByTokenHashForUpdate(tokenHash: string, executor: Executor): Promise<PasswordResetRow | undefined> {
    const [row] = await executor.select().from(passwordResets).where(eq(passwordResets.tokenHash, tokenHash)).limit(1).for('update');
    return row;
  }

  /** End a user's unused resets (a new request, or a completed reset, replaces them). */
  async expireOpen(userId: string, now: Date, executor: Executor): Promise<void> {
    await executor
      .update(passwordResets)
      .set({ expiresAt: now, updatedAt: now })
      .where(and(eq(passwordResets.userId, userId), isNull(passwordResets.usedAt), gt(passwordResets.expiresAt, now)));
  }

  /** Mark used if nobody did so first; false when it was already used. */
  async markUsed(id: string, now: Date, executor: Executor): Promise<boolean> {
    const rows = await executor
      .update(passwordResets)
      .set({ usedAt: now, updatedAt: now })
      .where(and(eq(passwordResets.id, id), isNull(passwordResets.usedAt)))
      .returning({ id: passwordResets.id });
    return rows.length === 1;
  }
}
