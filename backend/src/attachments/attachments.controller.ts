import { Controller, Get, Param, Post, Put, Query, Req, StreamableFile } from '@nestjs/common';
import type { Request } from 'express';
import { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { badInput } from '../common/errors/domain-error';
import { isImage } from './content-type';
import { AttachmentRow } from './attachments.repository';
import { attachmentUrl, AttachmentsService, MAX_ATTACHMENT_BYTES, ownerOf, thumbnailUrl } from './attachments.service';
import { UploadAttachmentQuery } from './dto/upload-attachment.query';

/** The request body as bytes, refusing more than `limit` without reading it all. */
async function readBody(request: Request, limit: number): Promise<Uint8Array> {
  if (request.readableEnded || (request.body !== undefined && typeof request.body === 'object' && Object.keys(request.body as object).length > 0)) {
    throw badInput('file', 'send the file bytes as the raw body (Content-Type: application/octet-stream or the file type), not JSON or a form');
  }
  const declared = Number(request.headers['content-length']);
  if (Number.isFinite(declared) && declared > limit) {
    request.resume();
    throw badInput('file', `the file is larger than ${limit / 1024 / 1024} MB`);
  }
  const chunks: Buffer[] = [];
  let size = 0;
  for await (const chunk of request) {
    size += (chunk as Buffer).length;
    if (size > limit) {
      request.resume();
      throw badInput('file', `the file is larger than ${limit / 1024 / 1024} MB`);
    }
    chunks.push(chunk as Buffer);
  }
  return Buffer.concat(chunks);
}

/**
 * Attachment files over plain HTTP. Upload: `POST /api/attachments?siteId=…&fileName=…` (or
 * `unitId`, `sampleId`; `PUT` is accepted too) with the file's bytes as the raw request body,
 * any Content-Type except JSON or a form; at most 20 MB. Answers 201 with the attachment record.
 * Download: `GET /api/attachments/:id`, members only (others get 404).
 */
@Controller('api/attachments')
export class AttachmentsController {
  constructor(private readonly attachments: AttachmentsService) {}

  @Post()
  create(@CurrentUser() user: AuthUser, @Query() query: UploadAttachmentQuery, @Req() request: Request) {
    return this.store(user, query, request);
  }

  @Put()
  put(@CurrentUser() user: AuthUser, @Query() query: UploadAttachmentQuery, @Req() request: Request) {
    return this.store(user, query, request);
  }

  @Get(':id/thumbnail')
  async thumbnail(@CurrentUser() user: AuthUser, @Param('id') id: string): Promise<StreamableFile> {
    const { attachment, bytes } = await this.attachments.thumbnail(user, id);
    return new StreamableFile(Buffer.from(bytes), { type: attachment.contentType, length: bytes.length, disposition: 'inline' });
  }

  @Get(':id')
  async download(@CurrentUser() user: AuthUser, @Param('id') id: string): Promise<StreamableFile> {
    const { attachment, bytes } = await this.attachments.download(user, id);
    // Images show in the page; everything else, PDFs included (they can run scripts in a viewer on
    // this origin), is a download.
    const inline = isImage(attachment.contentType);
    const type = attachment.contentType.startsWith('text/') ? `${attachment.contentType}; charset=utf-8` : attachment.contentType;
    return new StreamableFile(Buffer.from(bytes), {
      type,
      length: bytes.length,
      disposition: `${inline ? 'inline' : 'attachment'}; filename*=UTF-8''${encodeURIComponent(attachment.fileName)}`,
    });
  }

  private async store(user: AuthUser, query: UploadAttachmentQuery, request: Request) {
    const owner = ownerOf(query);
    const bytes = await readBody(request, MAX_ATTACHMENT_BYTES);
    return view(await this.attachments.upload(user, { owner, fileName: query.fileName, bytes }));
  }
}

function view(attachment: AttachmentRow) {
  return {
    id: attachment.id,
    fileName: attachment.fileName,
    contentType: attachment.contentType,
    sizeBytes: attachment.sizeBytes,
    createdAt: attachment.createdAt,
    url: attachmentUrl(attachment),
    thumbnailUrl: thumbnailUrl(attachment),
  };
}
