import { Injectable, Logger, OnModuleInit } from '@nestjs/common';
import { runInThread } from '../jobs/compute-runner';
import { JobRegistry } from '../jobs/job-registry';
import { TaskKind } from '../jobs/run-kind';
import { AttachmentsRepository } from './attachments.repository';
import { isImage } from './content-type';
import { ObjectStorageService } from './object-storage.service';
import type { ThumbnailContentType } from './thumbnail';
import { thumbnailCompute } from './thumbnail.compute';

/** The object key of an attachment's thumbnail, beside its file. */
export function thumbnailKeyOf(storageKey: string): string {
  return `${storageKey}.thumbnail`;
}

/**
 * Makes the thumbnail of one image attachment in a worker process (decoding runs in a worker
 * thread). An image that gets none (too large, undecodable) keeps none and is logged; it stays
 * downloadable. Idempotent: a retried job overwrites the same object. A thumbnail has no row of its
 * own to watch, so pg-boss retries it.
 */
@Injectable()
export class ThumbnailJob implements TaskKind<{ attachmentId: string }>, OnModuleInit {
  readonly type = 'task';
  readonly queue = 'attachment-thumbnail';
  readonly sendOptions = { retryLimit: 2, retryDelay: 5, expireInSeconds: 300 };
  private readonly logger = new Logger(ThumbnailJob.name);

  constructor(
    private readonly registry: JobRegistry,
    private readonly attachments: AttachmentsRepository,
    private readonly storage: ObjectStorageService,
  ) {}

  onModuleInit(): void {
    this.registry.register(this);
  }

  handle({ attachmentId }: { attachmentId: string }): Promise<void> {
    return this.execute(attachmentId);
  }

  async execute(attachmentId: string): Promise<void> {
    const attachment = await this.attachments.findById(attachmentId);
    if (!attachment || attachment.thumbnailKey || !isImage(attachment.contentType)) return;
    const bytes = await this.storage.get(attachment.storageKey);
    if (!bytes) return;
    let thumbnail;
    try {
      thumbnail = await runInThread(
        thumbnailCompute,
        { bytes, contentType: attachment.contentType as ThumbnailContentType },
        { onProgress: () => undefined, shouldCancel: async () => false },
      );
    } catch (error) {
      this.logger.warn(`no thumbnail for attachment ${attachmentId}: ${error instanceof Error ? error.message : String(error)}`);
      return;
    }
    const key = thumbnailKeyOf(attachment.storageKey);
    await this.storage.put(key, thumbnail.bytes, thumbnail.contentType);
    if (!(await this.attachments.setThumbnailKey(attachmentId, key))) await this.storage.delete(key).catch(() => undefined);
  }
}
