import { Injectable } from '@nestjs/common';
import { count, eq, sql } from 'drizzle-orm';
import { DatabaseService, Executor } from '../database/database.service';
import { users } from '../database/schema';

export type UserRow = typeof users.$inferSelect;

@Injectable()
export class UsersRepository {
  constructor(private readonly database: DatabaseService) {}

  async findByEmail(email: string, executor: Executor = this.database.db): Promise<UserRow | undefined> {
    const [row] = await executor.select().from(users).where(eq(sql`lower(${users.email})`, email.toLowerCase())).limit(1);
    return row;
  }

  async count(executor: Executor = this.database.db): Promise<number> {
    const [row] = await executor.select({ n: count() }).from(users);
    return row.n;
  }

  async findById(id: string, executor: Executor = this.database.db): Promise<UserRow | undefined> {
    const [row] = await executor.select().from(users).where(eq(users.id, id)).limit(1);
    return row;
  }

  async insert(values: typeof users.$inferInsert, executor: Executor = this.database.db): Promise<UserRow> {
    const [row] = await executor.insert(users).values(values).returning();
    return row;
  }

  /** Set a new password and move the token epoch, so every token issued before stops working. */
  async setPasswordHash(id: string, passwordHash: string, executor: Executor = this.database.db): Promise<void> {
    await executor
      .update(users)
      .set({ passwordHash, tokenEpoch: sql`${users.tokenEpoch} + 1`, updatedAt: new Date() })
      .where(eq(users.id, id));
  }

  /** The token epoch of a user, or undefined when the user no longer exists. */
  async tokenEpochOf(id: string, executor: Executor = this.database.db): Promise<number | undefined> {
    const [row] = await executor.select({ tokenEpoch: users.tokenEpoch }).from(users).where(eq(users.id, id)).limit(1);
    return row?.tokenEpoch;
  }
}
