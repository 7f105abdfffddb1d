import { Args, Mutation, Parent, Query, ResolveField, Resolver } from '@nestjs/graphql';
import { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { ProjectRow } from '../projects/projects.repository';
import { SegmentRow } from '../segments/segments.repository';
import { SiteRow } from '../sites/sites.repository';
import { FitRenewalInput, RenewalForecastInput, RenewalProbabilityInput } from './dto/renewal.input';
import { StartRecurrenceAnalysisInput } from './dto/start-recurrence-analysis.input';
import { SegmentEventTableInput } from './dto/segment-event-table.input';
import { IntervalNamesService } from './interval-names.service';
import { HypothesisRow, RecurrenceAnalysisRow, ReleaseRow } from './recurrence.repository';
import { RecurrenceAnalysisView, RecurrenceService } from './recurrence.service';

@Resolver('RecurrenceAnalysis')
export class RecurrenceResolver {
  constructor(
    private readonly recurrence: RecurrenceService,
    private readonly intervalNames: IntervalNamesService,
  ) {}

  @Query('renewalProbability')
  renewalProbability(@Args('input') input: RenewalProbabilityInput) {
    return this.recurrence.renewalProbability(input);
  }

  @Query('fitRenewal')
  fitRenewal(@Args('input') input: FitRenewalInput) {
    return this.recurrence.fitRenewal(input);
  }

  @Query('renewalForecast')
  renewalForecast(@Args('input') input: RenewalForecastInput) {
    return this.recurrence.renewalForecast(input);
  }

  @Query('segmentEventTable')
  segmentEventTable(@CurrentUser() user: AuthUser, @Args('input') input: SegmentEventTableInput) {
    return this.recurrence.eventTable(user, input);
  }

  @Query('recurrenceComparison')
  comparison(@CurrentUser() user: AuthUser, @Args('analysisAId') analysisAId: string, @Args('analysisBId') analysisBId: string) {
    return this.recurrence.comparison(user, analysisAId, analysisBId);
  }

  @Query('recurrenceAnalysis')
  get(@CurrentUser() user: AuthUser, @Args('id') id: string): Promise<RecurrenceAnalysisView> {
    return this.recurrence.getView(user, id);
  }

  @Mutation('startRecurrenceAnalysis')
  start(@CurrentUser() user: AuthUser, @Args('input') input: StartRecurrenceAnalysisInput): Promise<RecurrenceAnalysisView> {
    return this.recurrence.start(user, input);
  }

  @Mutation('cancelRecurrenceAnalysis')
  cancel(@CurrentUser() user: AuthUser, @Args('id') id: string): Promise<RecurrenceAnalysisView> {
    return this.recurrence.cancel(user, id);
  }

  /** Each interval with the names of the events at its ends. */
  @ResolveField('intervals')
  intervals(@Parent() analysis: RecurrenceAnalysisView) {
    return this.intervalNames.namedIntervals(analysis);
  }

  @ResolveField('segment')
  async segment(@Parent() analysis: RecurrenceAnalysisRow): Promise<SegmentRow | null> {
    return (await this.recurrence.segmentOf(analysis)) ?? null;
  }

  @ResolveField('site')
  async site(@Parent() analysis: RecurrenceAnalysisRow): Promise<SiteRow | null> {
    return (await this.recurrence.siteOf(analysis)) ?? null;
  }

  @ResolveField('hypothesis')
  async hypothesis(@Parent() analysis: RecurrenceAnalysisRow): Promise<HypothesisRow | null> {
    return (await this.recurrence.hypothesisOf(analysis)) ?? null;
  }

  @ResolveField('release')
  async release(@Parent() analysis: RecurrenceAnalysisRow): Promise<ReleaseRow | null> {
    return (await this.recurrence.releaseOf(analysis)) ?? null;
  }
}

/** `Project.recurrenceAnalyses`; the project itself was already authorised. */
@Resolver('Project')
export class ProjectRecurrenceResolver {
  constructor(private readonly recurrence: RecurrenceService) {}

  @ResolveField('recurrenceAnalyses')
  recurrenceAnalyses(@Parent() project: ProjectRow): Promise<RecurrenceAnalysisView[]> {
    return this.recurrence.listForProject(project.id);
  }
}
