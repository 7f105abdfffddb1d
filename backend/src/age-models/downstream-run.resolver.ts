import { Args, Context, Mutation, Parent, ResolveField, Resolver } from '@nestjs/graphql';
import { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { RequestLoaders } from '../loaders/request-loaders';
import type { ProjectRow } from '../projects/projects.repository';
import { SiteRow } from '../sites/sites.repository';
import { SitesService } from '../sites/sites.service';
import { UsersRepository } from '../users/users.repository';
import { AgeModelRunRow, AgeModelRunsRepository, DownstreamRunChoiceRow } from './age-model-runs.repository';
import { AgeModelsService } from './age-models.service';
import { ChooseDownstreamRunInput } from './dto/choose-downstream-run.input';

/** `chooseDownstreamRun`, `Site.downstreamRun`, `Site.downstreamRunChoice`. */
@Resolver('Site')
export class SiteDownstreamRunResolver {
  constructor(
    private readonly ageModels: AgeModelsService,
    private readonly runs: AgeModelRunsRepository,
  ) {}

  @Mutation('chooseDownstreamRun')
  choose(@CurrentUser() user: AuthUser, @Args('input') input: ChooseDownstreamRunInput): Promise<SiteRow> {
    return this.ageModels.chooseDownstreamRun(user, input);
  }

  @ResolveField('downstreamRun')
  async downstreamRun(@Parent() site: SiteRow, @Context('loaders') loaders: RequestLoaders): Promise<AgeModelRunRow | null> {
    const id = await loaders.downstreamRunId.load(site.id);
    return id ? ((await this.runs.runsForDisplay([id]))[0] ?? null) : null;
  }

  @ResolveField('downstreamRunChoice')
  async choice(@Parent() site: SiteRow): Promise<DownstreamRunChoiceRow | null> {
    return (await this.ageModels.choiceOf(site.id)) ?? null;
  }
}

@Resolver('AgeModelRun')
export class RunUsedDownstreamResolver {
  @ResolveField('usedDownstream')
  async usedDownstream(@Parent() run: AgeModelRunRow, @Context('loaders') loaders: RequestLoaders): Promise<boolean> {
    return (await loaders.downstreamRunId.load(run.siteId)) === run.id;
  }
}

@Resolver('Project')
export class ProjectDownstreamRunChoicesResolver {
  constructor(private readonly ageModels: AgeModelsService) {}

  @ResolveField('downstreamRunChoices')
  choices(@Parent() project: ProjectRow): Promise<DownstreamRunChoiceRow[]> {
    return this.ageModels.choicesOfProject(project.id);
  }
}

@Resolver('DownstreamRunChoice')
export class DownstreamRunChoiceResolver {
  constructor(
    private readonly ageModels: AgeModelsService,
    private readonly runs: AgeModelRunsRepository,
    private readonly sites: SitesService,
    private readonly users: UsersRepository,
  ) {}

  @ResolveField('site')
  site(@Parent() choice: DownstreamRunChoiceRow) {
    return this.sites.findById(choice.siteId);
  }

  @ResolveField('run')
  async run(@Parent() choice: DownstreamRunChoiceRow) {
    return (await this.runs.runsForDisplay([choice.ageModelRunId]))[0];
  }

  @ResolveField('newestRun')
  async newestRun(@Parent() choice: DownstreamRunChoiceRow) {
    const id = (await this.ageModels.newestSucceededId(choice.siteId)) ?? choice.ageModelRunId;
    return (await this.runs.runsForDisplay([id]))[0];
  }

  @ResolveField('newerRunExists')
  async newerRunExists(@Parent() choice: DownstreamRunChoiceRow): Promise<boolean> {
    const newest = await this.ageModels.newestSucceededId(choice.siteId);
    return newest !== undefined && newest !== choice.ageModelRunId;
  }

  @ResolveField('chosenBy')
  async chosenBy(@Parent() choice: DownstreamRunChoiceRow) {
    return choice.chosenById ? ((await this.users.findById(choice.chosenById)) ?? null) : null;
  }
}
