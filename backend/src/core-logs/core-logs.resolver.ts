import { Args, Int, Mutation, Parent, ResolveField, Resolver } from '@nestjs/graphql';
import { GraphQLError } from 'graphql';
import { AuthUser } from '../auth/auth-user';
import { DomainError } from '../common/errors/domain-error';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { SiteRow } from '../sites/sites.repository';
import { SitesService } from '../sites/sites.service';
import { CoreLogRow } from './core-logs.repository';
import { CoreLogsService, type CoreLogTraceView } from './core-logs.service';
import { UploadCoreLogInput } from './dto/upload-core-log.input';

@Resolver('CoreLog')
export class CoreLogsResolver {
  constructor(
    private readonly logs: CoreLogsService,
    private readonly sites: SitesService,
  ) {}

  @Mutation('uploadCoreLog')
  upload(@CurrentUser() user: AuthUser, @Args('input') input: UploadCoreLogInput): Promise<CoreLogRow> {
    return this.logs.upload(user, input);
  }

  @Mutation('deleteCoreLog')
  delete(@CurrentUser() user: AuthUser, @Args('id') id: string): Promise<boolean> {
    return this.logs.delete(user, id);
  }

  @ResolveField('site')
  site(@Parent() log: CoreLogRow): Promise<SiteRow | undefined> {
    return this.sites.findById(log.siteId);
  }

  @ResolveField('channels')
  channels(@Parent() log: CoreLogRow): string[] {
    return log.channels.map((channel) => channel.name);
  }

  @ResolveField('units')
  units(@Parent() log: CoreLogRow): string[] {
    return log.channels.map((channel) => channel.unit);
  }

  @ResolveField('traces')
  traces(
    @Parent() log: CoreLogRow,
    @Args('channels', { nullable: true }) channels: string[] | undefined,
    @Args('maxPoints', { type: () => Int }) maxPoints: number,
  ): CoreLogTraceView[] {
    // Nest's exception filters do not run for field resolvers, so a refusal is coded here.
    try {
      return this.logs.traces(log, channels ?? undefined, maxPoints);
    } catch (error) {
      if (error instanceof DomainError) {
        throw new GraphQLError(error.message, { extensions: { code: error.code, ...(error.field ? { field: error.field } : {}) } });
      }
      throw error;
    }
  }
}

/** `Site.coreLogs`; the site was already authorised. */
@Resolver('Site')
export class SiteCoreLogsResolver {
  constructor(private readonly logs: CoreLogsService) {}

  @ResolveField('coreLogs')
  coreLogs(@Parent() site: SiteRow): Promise<CoreLogRow[]> {
    return this.logs.listForSite(site.id);
  }
}
