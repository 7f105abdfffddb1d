import { Module } from '@nestjs/common';
import { AttachmentsController } from './attachments.controller';
import { AttachmentsRepository } from './attachments.repository';
import { AttachmentsResolver, SampleAttachmentsResolver, SiteAttachmentsResolver } from './attachments.resolver';
import { AttachmentsService } from './attachments.service';
import { ObjectStorageService } from './object-storage.service';
import { ThumbnailJob } from './thumbnail.job';

@Module({
  controllers: [AttachmentsController],
  providers: [
    ObjectStorageService, AttachmentsRepository, AttachmentsService, AttachmentsResolver, SiteAttachmentsResolver, SampleAttachmentsResolver,
    ThumbnailJob,
  ],
  exports: [ThumbnailJob],
})
export class AttachmentsModule {}
