import { Args, Mutation, Parent, ResolveField, Resolver } from '@nestjs/graphql';
import { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { AttachmentRow } from './attachments.repository';
import { attachmentUrl, AttachmentsService, thumbnailUrl } from './attachments.service';

@Resolver('Attachment')
export class AttachmentsResolver {
  constructor(private readonly attachments: AttachmentsService) {}

  @Mutation('deleteAttachment')
  delete(@CurrentUser() user: AuthUser, @Args('id') id: string): Promise<boolean> {
    return this.attachments.delete(user, id);
  }

  @ResolveField('url')
  url(@Parent() attachment: AttachmentRow): string {
    return attachmentUrl(attachment);
  }

  @ResolveField('thumbnailUrl')
  thumbnailUrl(@Parent() attachment: AttachmentRow): string | null {
    return thumbnailUrl(attachment);
  }
}

/** `Site.attachments`; the site was already authorised. */
@Resolver('Site')
export class SiteAttachmentsResolver {
  constructor(private readonly attachments: AttachmentsService) {}

  @ResolveField('attachments')
  attachmentsOf(@Parent() site: { id: string }): Promise<AttachmentRow[]> {
    return this.attachments.listForSite(site.id);
  }
}

/** `Sample.attachments`; the sample was already authorised. */
@Resolver('Sample')
export class SampleAttachmentsResolver {
  constructor(private readonly attachments: AttachmentsService) {}

  @ResolveField('attachments')
  attachmentsOf(@Parent() sample: { id: string }): Promise<AttachmentRow[]> {
    return this.attachments.listForSample(sample.id);
  }
}
