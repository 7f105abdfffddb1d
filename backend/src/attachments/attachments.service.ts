import { Injectable, Logger } from '@nestjs/common';
import { randomUUID } from 'node:crypto';
import { AccessService } from '../access/access.service';
import { Permission } from '../access/permissions';
import { AuditService } from '../audit/audit.service';
import { AuthUser } from '../auth/auth-user';
import { badInput, notFound } from '../common/errors/domain-error';
import { DatabaseService } from '../database/database.service';
import { JobQueueService } from '../jobs/job-queue.service';
import { ALLOWED_CONTENT_TYPES, isImage, safeFileName, sniffContentType } from './content-type';
import { AttachmentOwner, AttachmentRow, AttachmentsRepository } from './attachments.repository';
import { ObjectStorageService } from './object-storage.service';
import { thumbnailKeyOf, ThumbnailJob } from './thumbnail.job';

/** The largest attachment accepted, bytes. */
export const MAX_ATTACHMENT_BYTES = 20 * 1024 * 1024;

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export interface AttachmentUpload {
  owner: AttachmentOwner;
  fileName: string;
  bytes: Uint8Array;
}

export interface AttachmentDownload {
  attachment: AttachmentRow;
  bytes: Uint8Array;
}

/** The attachment's owner from a query naming exactly one of siteId, unitId, sampleId. */
export function ownerOf(query: { siteId?: string; unitId?: string; sampleId?: string }): AttachmentOwner {
  const given = [query.siteId && { siteId: query.siteId }, query.unitId && { unitId: query.unitId }, query.sampleId && { sampleId: query.sampleId }].filter(
    (owner): owner is AttachmentOwner => Boolean(owner),
  );
  if (given.length !== 1) throw badInput('siteId', 'name exactly one of siteId, unitId or sampleId');
  return given[0];
}

/** Files on sites, units and samples: bytes in object storage, the record (and audit) in the database. */
@Injectable()
export class AttachmentsService {
  private readonly logger = new Logger('Attachments');

  constructor(
    private readonly database: DatabaseService,
    private readonly attachments: AttachmentsRepository,
    private readonly storage: ObjectStorageService,
    private readonly access: AccessService,
    private readonly audit: AuditService,
    private readonly jobs: JobQueueService,
    private readonly thumbnails: ThumbnailJob,
  ) {}

  listForSite(siteId: string): Promise<AttachmentRow[]> {
    return this.attachments.listForSite(siteId);
  }

  listForSample(sampleId: string): Promise<AttachmentRow[]> {
    return this.attachments.listForSample(sampleId);
  }

  /**
   * Store an upload. The type is read from the bytes (PNG, JPEG, PDF, UTF-8 text), never from
   * the name. An image's thumbnail is made by a worker afterwards (`ThumbnailJob`); until then
   * `thumbnailUrl` is null.
   */
  async upload(user: AuthUser, { owner, fileName, bytes }: AttachmentUpload): Promise<AttachmentRow> {
    const objectName = Object.keys(owner)[0].replace('Id', '');
    const projectId = await this.attachments.ownerProjectId(owner);
    if (!projectId) throw notFound(objectName);
    await this.access.requireAccess({ user, permission: Permission.StratigraphyWrite, projectId, objectName });
    if (bytes.length === 0) throw badInput('file', 'the file is empty');
    if (bytes.length > MAX_ATTACHMENT_BYTES) throw badInput('file', `the file is larger than ${MAX_ATTACHMENT_BYTES / 1024 / 1024} MB`);
    const name = safeFileName(fileName);
    const contentType = sniffContentType(bytes, name);
    if (!contentType) {
      throw badInput('file', `the file's content is not an allowed type (PNG, JPEG, PDF, CSV or plain UTF-8 text); allowed: ${ALLOWED_CONTENT_TYPES.join(', ')}`);
    }
    const storageKey = `projects/${projectId}/attachments/${randomUUID()}`;
    await this.storage.put(storageKey, bytes, contentType);
    let attachment: AttachmentRow;
    try {
      attachment = await this.database.transaction(async (tx) => {
        const row = await this.attachments.insert(
          { projectId, ...owner, fileName: name, contentType, sizeBytes: bytes.length, storageKey, uploadedById: user.id },
          tx,
        );
        await this.audit.record(tx, { actor: user, projectId, action: 'create', objectType: 'attachment', objectId: row.id, after: row });
        return row;
      });
    } catch (error) {
      await this.storage.delete(storageKey).catch(() => undefined);
      throw error;
    }
    if (isImage(contentType)) {
      // The upload stands without a thumbnail: a queue that is away only costs the preview.
      await this.jobs.send(this.thumbnails, { attachmentId: attachment.id }).catch((error: unknown) => {
        this.logger.warn(`thumbnail of ${attachment.id} not queued: ${error instanceof Error ? error.message : String(error)}`);
      });
    }
    return attachment;
  }

  /** The thumbnail bytes of an image attachment for a project member; NOT_FOUND while there is none. */
  thumbnail(user: AuthUser, id: string): Promise<AttachmentDownload> {
    return this.read(user, id, (attachment) => attachment.thumbnailKey, 'thumbnail');
  }

  /** One stored object of an attachment, for a project member; NOT_FOUND for anyone else or when it is missing. */
  private async read(user: AuthUser, id: string, keyOf: (attachment: AttachmentRow) => string | null, what: string): Promise<AttachmentDownload> {
    const attachment = await this.find(id);
    await this.access.requireAccess({ user, permission: Permission.ProjectRead, projectId: attachment.projectId, objectName: 'attachment' });
    const key = keyOf(attachment);
    const bytes = key ? await this.storage.get(key) : undefined;
    if (!bytes) throw notFound(what);
    return { attachment, bytes };
  }

  /** The bytes of an attachment for a project member; NOT_FOUND for anyone else. */
  download(user: AuthUser, id: string): Promise<AttachmentDownload> {
    return this.read(user, id, (attachment) => attachment.storageKey, 'attachment file');
  }

  async delete(user: AuthUser, id: string): Promise<boolean> {
    const attachment = await this.find(id);
    await this.access.requireAccess({ user, permission: Permission.StratigraphyWrite, projectId: attachment.projectId, objectName: 'attachment' });
    await this.database.transaction(async (tx) => {
      await this.attachments.delete(id, tx);
      await this.audit.record(tx, { actor: user, projectId: attachment.projectId, action: 'delete', objectType: 'attachment', objectId: id, before: attachment });
    });
    // The record is gone either way; a leftover object is only wasted space, so log and go on.
    for (const key of [attachment.storageKey, thumbnailKeyOf(attachment.storageKey)]) {
      await this.storage.delete(key).catch((error: unknown) => {
        this.logger.warn(`could not delete object ${key}: ${error instanceof Error ? error.message : String(error)}`);
      });
    }
    return true;
  }

  private async find(id: string): Promise<AttachmentRow> {
    const attachment = UUID.test(id) ? await this.attachments.findById(id) : undefined;
    if (!attachment) throw notFound('attachment');
    return attachment;
  }
}

/** Relative download URL (bearer token required). */
export function attachmentUrl(attachment: AttachmentRow): string {
  return `/api/attachments/${attachment.id}`;
}

/** Relative URL of an image's thumbnail once a worker has made it; null before, and for other files. */
export function thumbnailUrl(attachment: AttachmentRow): string | null {
  return attachment.thumbnailKey ? `${attachmentUrl(attachment)}/thumbnail` : null;
}
