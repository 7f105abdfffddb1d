import { Args, Context, Int, Mutation, Parent, Query, ResolveField, Resolver } from '@nestjs/graphql';
import type { RequestLoaders } from '../loaders/request-loaders';
import { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { SegmentRow } from '../segments/segments.repository';
import { CreateSiteInput, UpdateSiteInput } from './dto/create-site.input';
import { SiteRow } from './sites.repository';
import { SitesService } from './sites.service';

@Resolver('Site')
export class SitesResolver {
  constructor(private readonly sites: SitesService) {}

  @Query('site')
  get(@CurrentUser() user: AuthUser, @Args('id') id: string): Promise<SiteRow> {
    return this.sites.get(user, id);
  }

  @Mutation('createSite')
  create(@CurrentUser() user: AuthUser, @Args('input') input: CreateSiteInput): Promise<SiteRow> {
    return this.sites.create(user, input);
  }

  @Mutation('updateSite')
  update(
    @CurrentUser() user: AuthUser,
    @Args('id') id: string,
    @Args('version', { type: () => Int }) version: number,
    @Args('input') input: UpdateSiteInput,
  ): Promise<SiteRow> {
    return this.sites.update(user, id, version, input);
  }

  @Mutation('deleteSite')
  delete(@CurrentUser() user: AuthUser, @Args('id') id: string): Promise<boolean> {
    return this.sites.delete(user, id);
  }

  @ResolveField('segment')
  async segment(@Parent() site: SiteRow, @Context('loaders') loaders: RequestLoaders): Promise<SegmentRow | null> {
    return site.segmentId ? loaders.segmentById.load(site.segmentId) : null;
  }
}

/** `Segment.sites`: kept here so the segments module does not depend on sites. */
@Resolver('Segment')
export class SegmentSitesResolver {
  constructor(private readonly sites: SitesService) {}

  @ResolveField('sites')
  sitesOf(@Parent() segment: SegmentRow): Promise<SiteRow[]> {
    return this.sites.listForSegment(segment.id);
  }
}
