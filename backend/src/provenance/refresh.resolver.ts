import { Args, Mutation, Parent, Query, ResolveField, Resolver } from '@nestjs/graphql';
import { AgeModelRunsRepository } from '../age-models/age-model-runs.repository';
import { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { RecurrenceService } from '../recurrence/recurrence.service';
import { SetRefreshSettingsInput } from './dto/set-refresh-settings.input';
import { RefreshPlanRow, RefreshRepository } from './refresh.repository';
import { refreshProgress, waitingFor } from './refresh-progress';
import { RefreshService } from './refresh.service';

@Resolver('RefreshPlan')
export class RefreshResolver {
  constructor(
    private readonly refresh: RefreshService,
    private readonly repository: RefreshRepository,
    private readonly runs: AgeModelRunsRepository,
    private readonly recurrence: RecurrenceService,
  ) {}

  @Mutation('refreshStaleResults')
  refreshStaleResults(@CurrentUser() user: AuthUser, @Args('projectId') projectId: string): Promise<RefreshPlanRow> {
    return this.refresh.refresh(user, projectId);
  }

  @Mutation('setRefreshSettings')
  setRefreshSettings(@CurrentUser() user: AuthUser, @Args('input') input: SetRefreshSettingsInput) {
    return this.refresh.setSettings(user, input);
  }

  @Query('refreshPlan')
  async refreshPlan(@CurrentUser() user: AuthUser, @Args('id') id: string): Promise<RefreshPlanRow> {
    const plan = await this.refresh.get(user, id);
    // Reading a plan also moves it on, so it progresses even between the timer's ticks.
    await this.refresh.advance(plan.id);
    return (await this.repository.findPlan(plan.id)) ?? plan;
  }

  @ResolveField('steps')
  async steps(@Parent() plan: RefreshPlanRow) {
    const steps = await this.refresh.stepsOf(plan.id);
    return steps.map((s) => ({ ...s, kind: s.resultKind, waitingFor: waitingFor(s, steps) }));
  }

  @ResolveField('progress')
  async progress(@Parent() plan: RefreshPlanRow) {
    return refreshProgress(await this.refresh.stepsOf(plan.id), (plan.skipped as unknown[] | null)?.length ?? 0);
  }

  @ResolveField('requestedBy')
  requestedBy(@Parent() plan: RefreshPlanRow) {
    return plan.requestedById ? this.repository.userRow(plan.requestedById) : null;
  }

  @ResolveField('ageModelRuns')
  async ageModelRuns(@Parent() plan: RefreshPlanRow) {
    const ids = (await this.refresh.stepsOf(plan.id)).filter((s) => s.resultKind === 'ageModelRun' && s.freshId).map((s) => s.freshId!);
    return this.runs.runsForDisplay(ids);
  }

  @ResolveField('jointRuns')
  async jointRuns(@Parent() plan: RefreshPlanRow) {
    return (await this.refresh.stepsOf(plan.id)).filter((s) => s.resultKind === 'jointRun' && s.freshId).map((s) => ({ id: s.freshId! }));
  }

  @ResolveField('recurrenceAnalyses')
  async recurrenceAnalyses(@Parent() plan: RefreshPlanRow) {
    const ids = (await this.refresh.stepsOf(plan.id)).filter((s) => s.resultKind === 'recurrenceAnalysis' && s.freshId).map((s) => s.freshId!);
    const rows = await Promise.all(ids.map((id) => this.repository.recurrenceAnalysis(id)));
    return rows.flatMap((row) => (row ? [this.recurrence.view(row)] : []));
  }
}

@Resolver('Project')
export class ProjectRefreshResolver {
  constructor(private readonly refresh: RefreshService) {}

  /** The parent project was already authorised. */
  @ResolveField('refreshPlans')
  refreshPlans(@Parent() project: { id: string }) {
    return this.refresh.plansOf(project.id);
  }

  @ResolveField('refreshSettings')
  refreshSettings(@Parent() project: { id: string }) {
    return this.refresh.settings(project.id);
  }
}
