import { Args, Mutation, Parent, Query, ResolveField, Resolver } from '@nestjs/graphql';
import { permissionNamesOf, Role } from '../access/permissions';
import { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { SegmentRow } from '../segments/segments.repository';
import { SegmentsService } from '../segments/segments.service';
import { SiteRow } from '../sites/sites.repository';
import { SitesService } from '../sites/sites.service';
import { CreateProjectInput } from './dto/create-project.input';
import { ProjectRow } from './projects.repository';
import { ProjectsService } from './projects.service';

@Resolver('Project')
export class ProjectsResolver {
  constructor(
    private readonly projects: ProjectsService,
    private readonly segments: SegmentsService,
    private readonly sites: SitesService,
  ) {}

  @Query('projects')
  list(@CurrentUser() user: AuthUser): Promise<ProjectRow[]> {
    return this.projects.listMine(user);
  }

  @Query('project')
  get(@CurrentUser() user: AuthUser, @Args('id') id: string): Promise<ProjectRow> {
    return this.projects.get(user, id);
  }

  @Mutation('createProject')
  create(@CurrentUser() user: AuthUser, @Args('input') input: CreateProjectInput): Promise<ProjectRow> {
    return this.projects.create(user, input);
  }

  @ResolveField('myRole')
  myRole(@Parent() project: ProjectRow, @CurrentUser() user: AuthUser): Promise<Role> {
    return this.projects.myRole(user, project.id);
  }

  /** What the caller's role allows here, from the server's role table. */
  @ResolveField('myPermissions')
  async myPermissions(@Parent() project: ProjectRow, @CurrentUser() user: AuthUser): Promise<string[]> {
    return permissionNamesOf(await this.projects.myRole(user, project.id));
  }

  @ResolveField('segments')
  segmentsOf(@Parent() project: ProjectRow): Promise<SegmentRow[]> {
    return this.segments.listForProject(project.id);
  }

  @ResolveField('sites')
  sitesOf(@Parent() project: ProjectRow): Promise<SiteRow[]> {
    return this.sites.listForProject(project.id);
  }
}
