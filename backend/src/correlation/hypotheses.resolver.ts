import { Args, Context, Mutation, Parent, Query, ResolveField, Resolver } from '@nestjs/graphql';
import { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { RequestLoaders } from '../loaders/request-loaders';
import type { ProjectRow } from '../projects/projects.repository';
import type { UserRow } from '../users/users.repository';
import { UsersService } from '../users/users.service';
import { AddTieInput } from './dto/add-tie.input';
import { CreateHypothesisInput, UpdateHypothesisInput } from './dto/create-hypothesis.input';
import { gridPoints, type DensityPoint } from '../chronology/common/density-views';
import { EventLadderService, EventLadderView, type LadderEventView } from './event-ladder.service';
import type { HypothesisRow, TieView } from './hypotheses.repository';
import { HypothesesService, OrderConflictView, RegionalEventView } from './hypotheses.service';

@Resolver('Hypothesis')
export class HypothesesResolver {
  constructor(
    private readonly hypotheses: HypothesesService,
    private readonly users: UsersService,
  ) {}

  @Query('hypothesis')
  get(@CurrentUser() user: AuthUser, @Args('id') id: string): Promise<HypothesisRow> {
    return this.hypotheses.get(user, id);
  }

  @Mutation('createHypothesis')
  create(@CurrentUser() user: AuthUser, @Args('input') input: CreateHypothesisInput): Promise<HypothesisRow> {
    return this.hypotheses.create(user, input);
  }

  @Mutation('updateHypothesis')
  update(@CurrentUser() user: AuthUser, @Args('id') id: string, @Args('input') input: UpdateHypothesisInput): Promise<HypothesisRow> {
    return this.hypotheses.update(user, id, input);
  }

  @Mutation('deleteHypothesis')
  delete(@CurrentUser() user: AuthUser, @Args('id') id: string): Promise<boolean> {
    return this.hypotheses.delete(user, id);
  }

  @Mutation('setPreferredHypothesis')
  setPreferred(@CurrentUser() user: AuthUser, @Args('id') id: string): Promise<HypothesisRow> {
    return this.hypotheses.setPreferred(user, id);
  }

  @Mutation('addTie')
  addTie(@CurrentUser() user: AuthUser, @Args('input') input: AddTieInput): Promise<TieView> {
    return this.hypotheses.addTie(user, input);
  }

  @Mutation('removeTie')
  removeTie(@CurrentUser() user: AuthUser, @Args('id') id: string): Promise<boolean> {
    return this.hypotheses.removeTie(user, id);
  }

  @ResolveField('author')
  async author(@Parent() hypothesis: HypothesisRow): Promise<UserRow | null> {
    return hypothesis.authorId ? ((await this.users.findById(hypothesis.authorId)) ?? null) : null;
  }

  @ResolveField('copiedFrom')
  copiedFrom(@Parent() hypothesis: HypothesisRow): Promise<HypothesisRow | null> {
    return hypothesis.copiedFromId ? this.hypotheses.findById(hypothesis.copiedFromId) : Promise.resolve(null);
  }

  @ResolveField('ties')
  ties(@Parent() hypothesis: HypothesisRow): Promise<TieView[]> {
    return this.hypotheses.listTies(hypothesis);
  }

  @ResolveField('regionalEvents')
  async regionalEvents(@Parent() hypothesis: HypothesisRow): Promise<RegionalEventView[]> {
    return (await this.hypotheses.checksOf(hypothesis)).regionalEvents;
  }

  @ResolveField('orderConflicts')
  async orderConflicts(@Parent() hypothesis: HypothesisRow): Promise<OrderConflictView[]> {
    return (await this.hypotheses.checksOf(hypothesis)).orderConflicts;
  }
}

/** `Project.hypotheses` and `Project.preferredHypothesis`; the project was already authorised. */
@Resolver('Project')
export class ProjectHypothesesResolver {
  constructor(private readonly hypotheses: HypothesesService) {}

  @ResolveField('hypotheses')
  hypothesesOf(@Parent() project: ProjectRow): Promise<HypothesisRow[]> {
    return this.hypotheses.listForProject(project.id);
  }

  @ResolveField('preferredHypothesis')
  preferred(@Parent() project: ProjectRow): Promise<HypothesisRow | null> {
    return this.hypotheses.preferredForProject(project.id);
  }
}

@Resolver('EventLadder')
export class EventLadderResolver {
  constructor(private readonly ladder: EventLadderService) {}

  @Query('eventLadder')
  async get(@CurrentUser() user: AuthUser, @Args('projectId') projectId: string, @Context('loaders') loaders: RequestLoaders): Promise<EventLadderView> {
    const ladder = await this.ladder.get(user, projectId);
    // Each column's run is judged stale against its site's column revision, read with the sites
    // just now: given to the request's loader, so that 40 sites are not read again.
    for (const column of ladder.columns) loaders.columnRevision.prime(column.site.id, column.site.columnRevision);
    return ladder;
  }

  @ResolveField('project')
  project(@Parent() ladder: EventLadderView): Promise<ProjectRow> {
    return this.ladder.project(ladder);
  }
}

/**
 * `LadderEvent.density` expanded from the grid only when a client asks (`densityGrid` is a plain
 * property: a Nest field resolver per event would cost more than the field itself).
 */
@Resolver('LadderEvent')
export class LadderEventResolver {
  @ResolveField('density')
  density(@Parent() event: LadderEventView): DensityPoint[] {
    return event.densityGrid ? gridPoints(event.densityGrid) : [];
  }
}
