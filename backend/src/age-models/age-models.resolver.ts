import { Args, Context, Mutation, Parent, Query, ResolveField, Resolver } from '@nestjs/graphql';
import type { RequestLoaders } from '../loaders/request-loaders';
import { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { EventHorizonRow } from '../event-horizons/event-horizons.repository';
import { EventHorizonsService } from '../event-horizons/event-horizons.service';
import { SampleRow, SamplesRepository } from '../samples/samples.repository';
import { SiteRow } from '../sites/sites.repository';
import { SitesService } from '../sites/sites.service';
import { AgeModelRunRow } from './age-model-runs.repository';
import { StoredAgeModelResults } from './age-model-results';
import { AgeModelsService } from './age-models.service';
import { StartAgeModelRunInput } from './dto/start-age-model-run.input';

/** Every year of a stored or decoded density as points. */
function densityPoints(density: { startCalBp: number; probabilities: ArrayLike<number> }) {
  return Array.from(density.probabilities, (probability, i) => ({ calBp: density.startCalBp + i, probability }));
}

@Resolver('AgeModelRun')
export class AgeModelsResolver {
  constructor(
    private readonly ageModels: AgeModelsService,
    private readonly sites: SitesService,
    private readonly eventHorizons: EventHorizonsService,
    private readonly samples: SamplesRepository,
  ) {}

  @Mutation('startAgeModelRun')
  start(@CurrentUser() user: AuthUser, @Args('input') input: StartAgeModelRunInput): Promise<AgeModelRunRow> {
    return this.ageModels.start(user, input);
  }

  @Mutation('cancelAgeModelRun')
  cancel(@CurrentUser() user: AuthUser, @Args('id') id: string): Promise<AgeModelRunRow> {
    return this.ageModels.cancel(user, id);
  }

  @Query('ageModelRun')
  get(@CurrentUser() user: AuthUser, @Args('id') id: string): Promise<AgeModelRunRow> {
    return this.ageModels.get(user, id);
  }

  @ResolveField('site')
  site(@Parent() run: AgeModelRunRow): Promise<SiteRow | undefined> {
    return this.sites.findById(run.siteId);
  }

  @ResolveField('stale')
  async stale(@Parent() run: AgeModelRunRow, @Context('loaders') loaders: RequestLoaders): Promise<boolean> {
    return (await loaders.columnRevision.load(run.siteId)) !== run.columnRevision;
  }

  @ResolveField('events')
  async events(@Parent() run: AgeModelRunRow) {
    const results = run.results as StoredAgeModelResults | null;
    if (!results) return [];
    const horizons = new Map((await this.eventHorizons.findByIds(results.events.map((e) => e.eventHorizonId))).map((h) => [h.id, h]));
    return results.events
      .filter((e) => horizons.has(e.eventHorizonId))
      .map((e) => ({ ...e.summary, eventHorizon: horizons.get(e.eventHorizonId), rhat: e.rhat, ess: e.ess, density: densityPoints(e.density) }));
  }

  @ResolveField('depthModel')
  depthModel(@Parent() run: AgeModelRunRow): string {
    return (run.settings as { depthModel?: string }).depthModel ?? 'ORDER_ONLY';
  }

  @ResolveField('ageDepth')
  ageDepth(@Parent() run: AgeModelRunRow) {
    return (run.results as StoredAgeModelResults | null)?.ageDepth ?? [];
  }

  @ResolveField('reservoirOffsets')
  async reservoirOffsets(@Parent() run: AgeModelRunRow) {
    const offsets = (run.results as StoredAgeModelResults | null)?.reservoirOffsets ?? [];
    if (offsets.length === 0) return [];
    const rows = new Map((await this.samples.listForSite(run.siteId)).map((s) => [s.id, s]));
    return offsets.map((o) => ({
      source: o.label,
      named: o.named,
      priorMeanYears: o.priorMeanYears,
      priorSdYears: o.priorSdYears,
      medianYears: o.medianYears,
      low95Years: o.low95Years,
      high95Years: o.high95Years,
      samples: o.sampleIds.filter((id) => rows.has(id)).map((id) => rows.get(id) as SampleRow),
    }));
  }

  @ResolveField('samples')
  async samplesOf(@Parent() run: AgeModelRunRow) {
    const results = run.results as StoredAgeModelResults | null;
    if (!results) return [];
    const rows = new Map((await this.samples.listForSite(run.siteId)).map((s) => [s.id, s]));
    return results.samples.filter((s) => rows.has(s.sampleId)).map((s) => ({ ...s, sample: rows.get(s.sampleId) as SampleRow }));
  }
}

/** `Site.ageModelRuns`, `Site.latestAgeModelRun` and `EventHorizon.latestPosterior`. */
@Resolver('Site')
export class SiteAgeModelsResolver {
  constructor(private readonly ageModels: AgeModelsService) {}

  @ResolveField('ageModelRuns')
  runs(@Parent() site: SiteRow): Promise<AgeModelRunRow[]> {
    return this.ageModels.listForSite(site.id);
  }

  @ResolveField('latestAgeModelRun')
  async latest(@Parent() site: SiteRow): Promise<AgeModelRunRow | null> {
    return (await this.ageModels.latestForSite(site.id)) ?? null;
  }
}

@Resolver('EventHorizon')
export class EventHorizonPosteriorResolver {
  /** Batched per request: the horizons of one answer share one read of their sites' runs. */
  @ResolveField('latestPosterior')
  async latestPosterior(@Parent() horizon: EventHorizonRow, @Context('loaders') loaders: RequestLoaders) {
    const posterior = (await loaders.latestRunBySite.load(horizon.siteId))?.posteriors.get(horizon.id);
    if (!posterior) return null;
    return { ...posterior.summary, eventHorizon: horizon, rhat: posterior.rhat, ess: posterior.ess, density: densityPoints(posterior.density) };
  }
}
