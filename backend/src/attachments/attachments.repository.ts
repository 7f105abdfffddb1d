import { Injectable } from '@nestjs/common';
import { asc, eq } from 'drizzle-orm';
import { DatabaseService, Executor } from '../database/database.service';
import { attachments, samples, sites, units } from '../database/schema';

export type AttachmentRow = typeof attachments.$inferSelect;
export type AttachmentOwner = { siteId: string } | { unitId: string } | { sampleId: string };

@Injectable()
export class AttachmentsRepository {
  constructor(private readonly database: DatabaseService) {}

  async findById(id: string, executor: Executor = this.database.db): Promise<AttachmentRow | undefined> {
    const [row] = await executor.select().from(attachments).where(eq(attachments.id, id)).limit(1);
    return row;
  }

  listForSite(siteId: string, executor: Executor = this.database.db): Promise<AttachmentRow[]> {
    return executor.select().from(attachments).where(eq(attachments.siteId, siteId)).orderBy(asc(attachments.createdAt));
  }

  listForSample(sampleId: string, executor: Executor = this.database.db): Promise<AttachmentRow[]> {
    return executor.select().from(attachments).where(eq(attachments.sampleId, sampleId)).orderBy(asc(attachments.createdAt));
  }

  /** The project of the site, unit or sample an attachment is for; undefined when it does not exist. */
  async ownerProjectId(owner: AttachmentOwner, executor: Executor = this.database.db): Promise<string | undefined> {
    if ('siteId' in owner) {
      const [row] = await executor.select({ projectId: sites.projectId }).from(sites).where(eq(sites.id, owner.siteId)).limit(1);
      return row?.projectId;
    }
    if ('unitId' in owner) {
      const [row] = await executor
        .select({ projectId: sites.projectId })
        .from(units)
        .innerJoin(sites, eq(sites.id, units.siteId))
        .where(eq(units.id, owner.unitId))
        .limit(1);
      return row?.projectId;
    }
    const [row] = await executor.select({ projectId: samples.projectId }).from(samples).where(eq(samples.id, owner.sampleId)).limit(1);
    return row?.projectId;
  }

  async insert(values: typeof attachments.$inferInsert, executor: Executor): Promise<AttachmentRow> {
    const [row] = await executor.insert(attachments).values(values).returning();
    return row;
  }

  /** Record a made thumbnail, unless the attachment was deleted meanwhile (then false). */
  async setThumbnailKey(id: string, thumbnailKey: string, executor: Executor = this.database.db): Promise<boolean> {
    const rows = await executor.update(attachments).set({ thumbnailKey }).where(eq(attachments.id, id)).returning({ id: attachments.id });
    return rows.length > 0;
  }

  async delete(id: string, executor: Executor): Promise<void> {
    await executor.delete(attachments).where(eq(attachments.id, id));
  }
}
