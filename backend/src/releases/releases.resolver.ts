import { Args, Mutation, Parent, Query, ResolveField, Resolver } from '@nestjs/graphql';
import { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { ProjectRow } from '../projects/projects.repository';
import { CreateReleaseInput } from './dto/create-release.input';
import { ReleaseRow, UserRow } from './releases.repository';
import { ReleaseDiffView, ReleasedSegmentView, ReleasedSiteView, ReleasesService } from './releases.service';

@Resolver('Release')
export class ReleasesResolver {
  constructor(private readonly releases: ReleasesService) {}

  @Query('release')
  get(@CurrentUser() user: AuthUser, @Args('id') id: string): Promise<ReleaseRow> {
    return this.releases.get(user, id);
  }

  @Query('releaseDiff')
  diff(@CurrentUser() user: AuthUser, @Args('fromId') fromId: string, @Args('toId') toId: string): Promise<ReleaseDiffView> {
    return this.releases.diff(user, fromId, toId);
  }

  @Mutation('createRelease')
  create(@CurrentUser() user: AuthUser, @Args('input') input: CreateReleaseInput): Promise<ReleaseRow> {
    return this.releases.create(user, input);
  }

  @ResolveField('sites')
  sites(@Parent() release: ReleaseRow): ReleasedSiteView[] {
    return this.releases.sitesOf(release);
  }

  @ResolveField('segments')
  segments(@Parent() release: ReleaseRow): ReleasedSegmentView[] {
    return this.releases.segmentsOf(release);
  }

  @ResolveField('createdBy')
  createdBy(@Parent() release: ReleaseRow): Promise<UserRow> {
    return this.releases.createdBy(release);
  }
}

/** `Project.releases`, newest first. */
@Resolver('Project')
export class ProjectReleasesResolver {
  constructor(private readonly releases: ReleasesService) {}

  @ResolveField('releases')
  releasesOf(@Parent() project: ProjectRow): Promise<ReleaseRow[]> {
    return this.releases.listForProject(project.id);
  }
}
