import { Injectable } from '@nestjs/common';
import { and, desc, eq, gte, lt, lte, SQL } from 'drizzle-orm';
import { DatabaseService, Executor } from '../database/database.service';
import { auditRecords, users } from '../database/schema';

export type AuditInsert = typeof auditRecords.$inferInsert;

export interface AuditFilter {
  projectId: string;
  actorId?: string;
  objectType?: string;
  objectId?: string;
  from?: Date;
  to?: Date;
  /** Return records older than this sequence number (cursor). */
  beforeSeq?: number;
  limit: number;
}

@Injectable()
export class AuditRepository {
  constructor(private readonly database: DatabaseService) {}

  async insert(entry: AuditInsert, executor: Executor = this.database.db): Promise<void> {
    await executor.insert(auditRecords).values(entry);
  }

  async insertMany(entries: AuditInsert[], executor: Executor = this.database.db): Promise<void> {
    for (let i = 0; i < entries.length; i += 1000) await executor.insert(auditRecords).values(entries.slice(i, i + 1000));
  }

  /** Newest first, paginated by sequence number. */
  list(filter: AuditFilter, executor: Executor = this.database.db) {
    const conditions: SQL[] = [eq(auditRecords.projectId, filter.projectId)];
    if (filter.actorId) conditions.push(eq(auditRecords.actorId, filter.actorId));
    if (filter.objectType) conditions.push(eq(auditRecords.objectType, filter.objectType));
    if (filter.objectId) conditions.push(eq(auditRecords.objectId, filter.objectId));
    if (filter.from) conditions.push(gte(auditRecords.at, filter.from));
    if (filter.to) conditions.push(lte(auditRecords.at, filter.to));
    if (filter.beforeSeq !== undefined) conditions.push(lt(auditRecords.seq, filter.beforeSeq));
    return executor
      .select({ record: auditRecords, actor: users })
      .from(auditRecords)
      .leftJoin(users, eq(users.id, auditRecords.actorId))
      .where(and(...conditions))
      .orderBy(desc(auditRecords.seq))
      .limit(filter.limit);
  }
}
