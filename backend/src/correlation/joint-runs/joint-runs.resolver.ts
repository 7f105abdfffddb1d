import { Args, Context, Mutation, Parent, Query, ResolveField, Resolver } from '@nestjs/graphql';
import type DataLoader from 'dataloader';
import { AuthUser } from '../../auth/auth-user';
import { CurrentUser } from '../../common/decorators/current-user.decorator';
import { EventHorizonsRepository, type EventHorizonRow } from '../../event-horizons/event-horizons.repository';
import { reasonsView } from '../../provenance/provenance.resolver';
import { ProvenanceService, type ResultReference } from '../../provenance/provenance.service';
import type { StaleReason } from '../../provenance/staleness';
import { SamplesRepository, type SampleRow } from '../../samples/samples.repository';
import { SitesService } from '../../sites/sites.service';
import type { HypothesisRow } from '../hypotheses.repository';
import { HypothesesService, type RegionalEventView } from '../hypotheses.service';
import { StartJointAgeModelRunInput } from './dto/start-joint-age-model-run.input';
import { FreshJointRun, FreshJointRunsService } from './fresh-joint-runs.service';
import { progressOf } from './joint-run-settler';
import type { StoredJointModelInput, StoredJointResults } from './joint-run-storage';
import { JointRunRow, JointRunsRepository } from './joint-runs.repository';
import { JointRunsService } from './joint-runs.service';

/** What this file keeps in the GraphQL context for one request. */
interface JointRunsContext {
  staleReasons?: DataLoader<ResultReference, readonly StaleReason[], string>;
  freshJointRuns?: Map<string, Promise<FreshJointRun | null>>;
}

function densityPoints(density: { startCalBp: number; probabilities: ArrayLike<number> }) {
  return Array.from(density.probabilities, (probability, i) => ({ calBp: density.startCalBp + i, probability }));
}

function resultsOf(run: JointRunRow): StoredJointResults | null {
  return run.results as StoredJointResults | null;
}

async function horizonsById(repository: EventHorizonsRepository, ids: string[]): Promise<Map<string, EventHorizonRow>> {
  return new Map((await repository.findByIds([...new Set(ids)])).map((h) => [h.id, h]));
}

@Resolver('JointAgeModelRun')
export class JointRunsResolver {
  constructor(
    private readonly service: JointRunsService,
    private readonly repository: JointRunsRepository,
    private readonly hypotheses: HypothesesService,
    private readonly sites: SitesService,
    private readonly eventHorizons: EventHorizonsRepository,
    private readonly samples: SamplesRepository,
    private readonly provenance: ProvenanceService,
  ) {}

  @Mutation('startJointAgeModelRun')
  start(@CurrentUser() user: AuthUser, @Args('input') input: StartJointAgeModelRunInput): Promise<JointRunRow> {
    return this.service.start(user, input);
  }

  @Mutation('cancelJointAgeModelRun')
  cancel(@CurrentUser() user: AuthUser, @Args('id') id: string): Promise<JointRunRow> {
    return this.service.cancel(user, id);
  }

  @Query('jointAgeModelRun')
  get(@CurrentUser() user: AuthUser, @Args('id') id: string): Promise<JointRunRow> {
    return this.service.get(user, id);
  }

  @ResolveField('hypothesis')
  hypothesis(@Parent() run: JointRunRow): Promise<HypothesisRow | null> {
    return this.hypotheses.findById(run.hypothesisId);
  }

  @ResolveField('progress')
  async progress(@Parent() run: JointRunRow): Promise<number> {
    if (run.status === 'SUCCEEDED') return 1;
    if (run.status !== 'QUEUED' && run.status !== 'RUNNING') return run.progress;
    // Never 1 before the results are stored: 1 means finished.
    return Math.min(0.99, progressOf(await this.repository.chainStates(run.id)));
  }

  @ResolveField('chains')
  async chains(@Parent() run: JointRunRow) {
    return (await this.repository.chainStates(run.id)).map((c) => ({ ...c, index: c.chainIndex }));
  }

  @ResolveField('stale')
  async stale(@Parent() run: JointRunRow, @Context() context: JointRunsContext): Promise<boolean> {
    return (await this.reasons(run, context)).length > 0;
  }

  @ResolveField('staleReasons')
  async staleReasons(@Parent() run: JointRunRow, @Context() context: JointRunsContext) {
    return reasonsView(await this.reasons(run, context));
  }

  @ResolveField('sites')
  async sitesOf(@Parent() run: JointRunRow) {
    const ids = new Set((run.inputSnapshot as StoredJointModelInput).sites.map((s) => s.siteId));
    return (await this.sites.listForProject(run.projectId)).filter((s) => ids.has(s.id));
  }

  @ResolveField('depthModels')
  depthModels(@Parent() run: JointRunRow) {
    return (run.inputSnapshot as StoredJointModelInput).sites.map((s) => ({ siteId: s.siteId, siteName: s.siteName, depthModel: s.depthModel }));
  }

  @ResolveField('regionalEvents')
  async regionalEvents(@Parent() run: JointRunRow) {
    const results = resultsOf(run);
    if (!results) return [];
    const horizons = await horizonsById(this.eventHorizons, results.regionalEvents.flatMap((r) => r.memberIds));
    return results.regionalEvents.map((r) => ({
      id: r.regionalEventId,
      members: r.memberIds.flatMap((id) => horizons.get(id) ?? []),
      ...r.summary,
      rhat: r.rhat,
      ess: r.ess,
      density: densityPoints(r.density),
    }));
  }

  @ResolveField('siteEvents')
  async siteEvents(@Parent() run: JointRunRow) {
    const results = resultsOf(run);
    if (!results) return [];
    const horizons = await horizonsById(this.eventHorizons, results.siteEvents.map((e) => e.eventHorizonId));
    return results.siteEvents
      .filter((e) => horizons.has(e.eventHorizonId))
      .map((e) => ({ ...e.summary, eventHorizon: horizons.get(e.eventHorizonId), rhat: e.rhat, ess: e.ess, density: densityPoints(e.density) }));
  }

  @ResolveField('samples')
  async samplesOf(@Parent() run: JointRunRow) {
    const results = resultsOf(run);
    if (!results) return [];
    const siteIds = [...new Set(results.samples.map((s) => s.siteId))];
    const rows = new Map<string, SampleRow>();
    for (const siteId of siteIds) for (const sample of await this.samples.listForSite(siteId)) rows.set(sample.id, sample);
    return results.samples.filter((s) => rows.has(s.sampleId)).map((s) => ({ ...s, sample: rows.get(s.sampleId) }));
  }

  private reasons(run: JointRunRow, context: JointRunsContext) {
    context.staleReasons ??= this.provenance.loader();
    return context.staleReasons.load({ kind: 'jointRun', id: run.id });
  }
}

/** `Hypothesis.latestJointRun` and `Hypothesis.jointRuns`; the parent was authorised. */
@Resolver('Hypothesis')
export class HypothesisJointRunsResolver {
  constructor(
    private readonly service: JointRunsService,
    private readonly repository: JointRunsRepository,
  ) {}

  @ResolveField('latestJointRun')
  latestJointRun(@Parent() hypothesis: HypothesisRow): Promise<JointRunRow | null> {
    return this.service.latestForHypothesis(hypothesis.id);
  }

  @ResolveField('jointRuns')
  jointRuns(@Parent() hypothesis: HypothesisRow): Promise<JointRunRow[]> {
    return this.repository.listForHypothesis(hypothesis.id);
  }
}

/**
 * A regional event's joint age beside its product-of-marginals age: from the hypothesis' fresh
 * joint run (succeeded, nothing changed since), which is then the age shown.
 */
@Resolver('RegionalEvent')
export class RegionalEventJointAgeResolver {
  constructor(private readonly fresh: FreshJointRunsService) {}

  @ResolveField('jointRun')
  async jointRun(@Parent() event: RegionalEventView, @Context() context: JointRunsContext): Promise<JointRunRow | null> {
    const found = await this.posterior(event, context);
    return found ? found.run : null;
  }

  @ResolveField('jointMedianCalBp')
  async jointMedianCalBp(@Parent() event: RegionalEventView, @Context() context: JointRunsContext): Promise<number | null> {
    return (await this.posterior(event, context))?.posterior.summary.medianCalBp ?? null;
  }

  @ResolveField('jointHpd95')
  async jointHpd95(@Parent() event: RegionalEventView, @Context() context: JointRunsContext) {
    return (await this.posterior(event, context))?.posterior.summary.hpd95 ?? [];
  }

  @ResolveField('ageShown')
  async ageShown(@Parent() event: RegionalEventView, @Context() context: JointRunsContext): Promise<'JOINT_RUN' | 'COMBINED_DENSITIES'> {
    return (await this.posterior(event, context)) ? 'JOINT_RUN' : 'COMBINED_DENSITIES';
  }

  private async posterior(event: RegionalEventView, context: JointRunsContext) {
    context.freshJointRuns ??= new Map();
    let pending = context.freshJointRuns.get(event.hypothesisId);
    if (!pending) {
      pending = this.fresh.forHypothesis(event.hypothesisId);
      context.freshJointRuns.set(event.hypothesisId, pending);
    }
    const fresh = await pending;
    const posterior = fresh?.results.regionalEvents.find((r) => r.regionalEventId === event.id);
    return fresh && posterior ? { run: fresh.run, posterior } : null;
  }
}
