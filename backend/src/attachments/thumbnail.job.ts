import { Injectable, Logger } from '@nestjs/common';
import { runInThread } from '../jobs/compute-runner';
import { AttachmentsRepository } from './attachments.repository';
import { isImage } from './content-type';
import { ObjectStorageService } from './object-storage.service';
import type { ThumbnailContentType } from './thumbnail';

/** The object key of an attachment's thumbnail, beside its file. */
export function thumbnailKeyOf(storageKey: string): string {
  return `${storageKey}.thumbnail`;
}

/**
 * Makes the thumbnail of one image attachment in a worker process (decoding runs in a worker
 * thread). An image that gets none (too large, undecodable) keeps none and is logged; it stays
 * downloadable. Idempotent: a retried job overwrites the same object.
 */
@Injectable()
export class ThumbnailJob {
  private readonly logger = new Logger(ThumbnailJob.name);

  constructor(
    private readonly attachments: AttachmentsRepository,
    private readonly storage: ObjectStorageService,
  ) {}

  async execute(attachmentId: string): Promise<void> {
    const attachment = await this.attachments.findById(attachmentId);
    if (!attachment || attachment.thumbnailKey || !isImage(attachment.contentType)) return;
    const bytes = await this.storage.get(attachment.storageKey);
    if (!bytes) return;
    let thumbnail;
    try {
      thumbnail = await runInThread(
        { kind: 'thumbnail', bytes, contentType: attachment.contentType as ThumbnailContentType },
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
