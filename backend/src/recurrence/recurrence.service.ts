import { Injectable } from '@nestjs/common';
import { isUUID } from 'class-validator';
import { AccessService } from '../access/access.service';
import { Permission } from '../access/permissions';
import { AgeModelRunsRepository } from '../age-models/age-model-runs.repository';
import { StoredAgeModelResults, storeDensity } from '../age-models/age-model-results';
import { LatestRunsService } from '../age-models/latest-runs.service';
import { AuditService } from '../audit/audit.service';
import { ProvenanceService } from '../provenance/provenance.service';
import { ReleasesService } from '../releases/releases.service';
import { AuthUser } from '../auth/auth-user';
import type { SiteEvent } from '../chronology/correlation';
import {
  fitRenewalModel,
  forecastRenewal,
  RecurrenceInputError,
  RENEWAL_MODELS,
  RENEWAL_PRIOR_NOTE,
  renewalDistribution,
} from '../chronology/recurrence';
import { badInput, conflict, notFound } from '../common/errors/domain-error';
import { DatabaseService } from '../database/database.service';
import { JobQueueService } from '../jobs/job-queue.service';
import { SegmentRow } from '../segments/segments.repository';
import { SegmentsService } from '../segments/segments.service';
import { SiteRow } from '../sites/sites.repository';
import { SitesService } from '../sites/sites.service';
import { FitRenewalInput, RenewalForecastInput, RenewalProbabilityInput } from './dto/renewal.input';
import { RecurrenceJob } from './recurrence.job';
import { DEFAULT_DRAWS, DEFAULT_WINDOWS_YEARS, StartRecurrenceAnalysisInput } from './dto/start-recurrence-analysis.input';
import { RECURRENCE_CAUTION } from './recurrence-caution';
import { RecurrenceExport, recurrenceExport, recurrenceExportCsv, RecurrenceExportHeader } from './recurrence-export';
import { checkForecastStart, hypothesisOnSegment, MINIMUM_EVENTS, segmentRegionalEvents, youngestDrawnAge } from './recurrence-inputs';
import { compareAnalyses, ComparedSide, RecurrenceComparison, recurrenceComparisonCsv } from './recurrence-comparison';
import { CountingRuleInput, countingRuleOf, inclusionOf, segmentEventTable, StoredEventTable } from './segment-event-table';
import { SegmentEventTableInput } from './dto/segment-event-table.input';
import { FreshJointRunsService } from '../correlation/joint-runs/fresh-joint-runs.service';
import { EventAgeSource, jointSegmentDraws } from './joint-run-source';
import { StoredRecurrenceResults } from './recurrence-results';
import { HypothesisRow, RecurrenceAnalysisRow, RecurrenceRepository, ReleaseRow } from './recurrence.repository';

/** What an analysis was computed from, stored in `input_snapshot` so it can be rerun and cited. */
export type RecurrenceInputSnapshot =
  | {
      kind: 'site';
      siteId: string;
      ageModelRunId: string;
      /** The run's events, oldest first. */
      eventHorizonIds: string[];
      availableDraws: number;
    }
  | {
      kind: 'segment';
      segmentId: string;
      hypothesisId: string;
      hypothesisVersion: number;
      ageModelRunIds: string[];
      /** Young to old, each with the combined density the draws come from. */
      regionalEvents: {
        id: string;
        memberIds: string[];
        siteIds: string[];
        medianCalBp: number;
        density: { startCalBp: number; probabilities: number[] };
        /** Probability of being in a draw's record under the counting rule; absent (1) before the rule. */
        inclusionProbability?: number;
      }[];
      skippedTieIds: string[];
      orderConflictCount: number;
      /** The event table the analysis used, with its rule; absent in analyses stored before it. */
      eventTable?: StoredEventTable;
      /** The fresh joint run whose regional draws the ages come from (source JOINT_RUN); absent otherwise. */
      jointRunId?: string;
      /** Its joint draws available for these events. */
      availableDraws?: number;
    };

/** The analysis as the API serves it: the row, its stored results spread in, and the caution. */
export type RecurrenceAnalysisView = RecurrenceAnalysisRow &
  Partial<StoredRecurrenceResults> &
  Pick<StoredRecurrenceResults, 'intervals' | 'poisson' | 'models' | 'curves' | 'histogram'> & { modelAveraged: NonNullable<StoredRecurrenceResults['modelAveraged']> } & { caution: string } & {
    eventTable: StoredEventTable | null;
  };

const NO_RESULTS = { intervals: [], poisson: [], models: [], modelAveraged: [], curves: [], histogram: [] };

@Injectable()
export class RecurrenceService {
  constructor(
    private readonly database: DatabaseService,
    private readonly analyses: RecurrenceRepository,
    private readonly segments: SegmentsService,
    private readonly sites: SitesService,
    private readonly latestRuns: LatestRunsService,
    private readonly ageModelRuns: AgeModelRunsRepository,
    private readonly jobs: JobQueueService,
    private readonly recurrenceJob: RecurrenceJob,
    private readonly access: AccessService,
    private readonly audit: AuditService,
    private readonly releases: ReleasesService,
    private readonly provenance: ProvenanceService,
    private readonly freshJointRuns: FreshJointRunsService,
  ) {}

  /** Conditional probability of one renewal model in a window, beside the Poisson figure, and the hazard at the elapsed time. */
  renewalProbability(input: RenewalProbabilityInput) {
    const alpha = input.model === 'POISSON' ? 1 : input.aperiodicity;
    if (!(alpha > 0)) throw badInput('aperiodicity', `aperiodicity must be a positive number for ${input.model}`);
    const distribution = refuseRange('aperiodicity', () => renewalDistribution(input.model, input.meanRecurrenceYears, alpha));
    const hazardRatePerYear = distribution.hazard(input.elapsedYears);
    if (!Number.isFinite(hazardRatePerYear)) {
      throw badInput('elapsedYears', `the ${input.model} hazard rate is infinite at ${input.elapsedYears} years; give a later elapsed time`);
    }
    return {
      conditionalProbability: refuseRange('elapsedYears', () => distribution.conditionalProbability(input.elapsedYears, input.windowYears)),
      // 1 - exp(-dT / mu), the time-independent figure (SPEC, Computation 4).
      poissonProbability: -Math.expm1(-input.windowYears / input.meanRecurrenceYears),
      hazardRatePerYear,
    };
  }

  /** Maximum-likelihood fit of one model to closed intervals and an optional open interval. */
  fitRenewal(input: FitRenewalInput) {
    try {
      const fit = fitRenewalModel(input.model, { closedIntervals: input.intervalsYears, openInterval: input.openIntervalYears ?? null });
      return { model: fit.model, meanRecurrenceYears: fit.mu, aperiodicity: fit.alpha, logLikelihood: fit.logLikelihood, aic: fit.aic, aicc: fit.aicc };
    } catch (error) {
      throw asDomainError(error, { closedIntervals: 'intervalsYears', openInterval: 'openIntervalYears' });
    }
  }

  /** Posterior ranges for exactly known intervals (no project data, so no access check); bounded by the input's limits. */
  renewalForecast(input: RenewalForecastInput) {
    try {
      const result = forecastRenewal({
        model: input.model,
        intervalsYears: input.intervalsYears,
        openIntervalYears: input.openIntervalYears,
        windowsYears: input.windowsYears,
        seed: input.seed ?? 1,
      });
      return {
        model: result.model,
        draws: result.draws,
        meanRecurrence: result.meanRecurrence,
        aperiodicity: result.aperiodicity,
        probabilities: result.probabilities.map((p) => ({ windowYears: p.windowYears, ...p.range })),
        approximateDraws: result.approximateDraws,
        priorNote: RENEWAL_PRIOR_NOTE,
        caution: RECURRENCE_CAUTION,
      };
    } catch (error) {
      throw asDomainError(error, { closedIntervals: 'intervalsYears', openInterval: 'openIntervalYears' });
    }
  }

  /**
   * Choose and check the analysis' events (BAD_USER_INPUT before anything is queued), store the
   * analysis with its inputs and queue it.
   */
  async start(user: AuthUser, input: StartRecurrenceAnalysisInput): Promise<RecurrenceAnalysisView> {
    if (input.segmentId && input.siteId) throw badInput('siteId', 'give a segment or a site, not both');
    if (!input.segmentId && !input.siteId) {
      throw badInput('segmentId', 'give a segment (with a hypothesis, or the project’s preferred one) or a single site');
    }
    const forecastStartYear = input.forecastStartYear ?? new Date().getUTCFullYear();
    const windowsYears = [...(input.windowsYears ?? DEFAULT_WINDOWS_YEARS)];
    const drawsRequested = input.draws ?? DEFAULT_DRAWS;
    const seed = input.seed ?? Math.floor(Math.random() * 2 ** 31);

    const prepared = input.siteId
      ? await this.prepareSite(user, input.siteId, input, forecastStartYear)
      : await this.prepareSegment(user, input.segmentId as string, input, forecastStartYear);
    let releaseId: string | null = null;
    if (input.releaseId) {
      // Age models are not part of a release's frozen data, so an analysis is pinned to a release
      // only while the live data are exactly as released: then it was computed from that release.
      const release = await this.analyses.findRelease(input.releaseId);
      if (!release || release.projectId !== prepared.projectId) throw notFound('release');
      const changes = await this.releases.changesSince(release.id);
      if (changes.length > 0) {
        throw badInput(
          'releaseId',
          `the project's data changed since release ${release.number} (${changes.length} added, changed or removed records); an analysis can be pinned to a release only while the data are as released`,
        );
      }
      releaseId = release.id;
    }
    const available = prepared.snapshot.availableDraws;
    const draws = available !== undefined ? Math.min(drawsRequested, available) : drawsRequested;
    const source: EventAgeSource = prepared.snapshot.kind === 'site' ? 'SITE_RUN' : prepared.snapshot.jointRunId ? 'JOINT_RUN' : 'COMBINED_DENSITIES';
    const jointRunId = prepared.snapshot.kind === 'segment' ? prepared.snapshot.jointRunId : undefined;
    const settings = {
      source: prepared.snapshot.kind,
      drawsRequested,
      models: RENEWAL_MODELS,
      curvePoints: 200,
      ageModelRunIds: prepared.snapshot.kind === 'site' ? [prepared.snapshot.ageModelRunId] : prepared.snapshot.ageModelRunIds,
    };

    const analysis = await this.database.transaction(async (tx) => {
      const row = await this.analyses.insert(
        {
          projectId: prepared.projectId,
          segmentId: prepared.snapshot.kind === 'segment' ? prepared.snapshot.segmentId : null,
          siteId: prepared.snapshot.kind === 'site' ? prepared.snapshot.siteId : null,
          hypothesisId: prepared.snapshot.kind === 'segment' ? prepared.snapshot.hypothesisId : null,
          hypothesisVersion: prepared.snapshot.kind === 'segment' ? prepared.snapshot.hypothesisVersion : null,
          releaseId,
          requestedById: user.id,
          seed,
          forecastStartYear,
          windowsYears,
          draws,
          settings,
          source,
          inputSnapshot: prepared.snapshot,
          message: prepared.message,
        },
        tx,
      );
      await this.audit.record(tx, {
        actor: user,
        projectId: row.projectId,
        action: 'run',
        objectType: 'recurrenceAnalysis',
        objectId: row.id,
        after: { segmentId: row.segmentId, siteId: row.siteId, hypothesisId: row.hypothesisId, hypothesisVersion: row.hypothesisVersion, seed, forecastStartYear, windowsYears, draws, settings },
      });
      // Provenance: the runs whose ages it used (site runs, or the joint run) and the hypothesis version, for `stale` and refresh.
      await this.provenance.record(tx, row.projectId, { kind: 'recurrenceAnalysis', id: row.id }, [
        ...(jointRunId ? [{ kind: 'jointRun' as const, id: jointRunId }] : settings.ageModelRunIds.map((id) => ({ kind: 'ageModelRun' as const, id }))),
        ...(row.hypothesisId && row.hypothesisVersion !== null ? [{ kind: 'hypothesis' as const, id: row.hypothesisId, revision: row.hypothesisVersion }] : []),
      ]);
      return row;
    });
    await this.jobs.send(this.recurrenceJob, { runId: analysis.id });
    return this.view(analysis);
  }

  async get(user: AuthUser, id: string, permission = Permission.ProjectRead): Promise<RecurrenceAnalysisRow> {
    const analysis = isUUID(id) ? await this.analyses.findById(id) : undefined;
    if (!analysis) throw notFound('recurrence analysis');
    await this.access.requireAccess({ user, permission, projectId: analysis.projectId, objectName: 'recurrence analysis' });
    return analysis;
  }

  async getView(user: AuthUser, id: string): Promise<RecurrenceAnalysisView> {
    return this.view(await this.get(user, id));
  }

  async cancel(user: AuthUser, id: string): Promise<RecurrenceAnalysisView> {
    const analysis = await this.get(user, id, Permission.RecurrenceRun);
    const cancelled = await this.database.transaction(async (tx) => {
      const row = await this.analyses.cancel(id, tx);
      if (!row) return undefined;
      await this.audit.record(tx, { actor: user, projectId: row.projectId, action: 'cancel', objectType: 'recurrenceAnalysis', objectId: id });
      return row;
    });
    if (!cancelled) throw badInput('id', `the analysis has already ended (${analysis.status})`);
    return this.view(cancelled);
  }

  /** A project's analyses, newest first; the caller already read the project. */
  async listForProject(projectId: string): Promise<RecurrenceAnalysisView[]> {
    return (await this.analyses.listForProject(projectId)).map((row) => this.view(row));
  }

  view(row: RecurrenceAnalysisRow): RecurrenceAnalysisView {
    const results = row.results as StoredRecurrenceResults | null;
    return { ...row, ...NO_RESULTS, ...(results ?? {}), caution: RECURRENCE_CAUTION, eventTable: eventTableOf(row) };
  }

  /** The export of a finished analysis (CONFLICT while it has no results). */
  async exportOf(user: AuthUser, id: string): Promise<{ json: RecurrenceExport; csv: string }> {
    const analysis = await this.get(user, id);
    const results = analysis.results as StoredRecurrenceResults | null;
    if (analysis.status !== 'SUCCEEDED' || !results) throw conflict(`the analysis has no results to export (${analysis.status})`);
    const settings = analysis.settings as { ageModelRunIds?: string[] };
    const ageModelRunIds = settings.ageModelRunIds ?? [];
    const recorded = await this.provenance.inputsOf({ kind: 'recurrenceAnalysis', id: analysis.id });
    const runName = new Map(recorded.filter((i) => i.kind === 'ageModelRun').map((i) => [i.id, i.name]));
    const header: RecurrenceExportHeader = {
      id: analysis.id,
      projectId: analysis.projectId,
      segmentId: analysis.segmentId,
      siteId: analysis.siteId,
      hypothesisId: analysis.hypothesisId,
      hypothesisVersion: analysis.hypothesisVersion,
      ageModelRunIds,
      jointRunId: recorded.find((i) => i.kind === 'jointRun')?.id ?? null,
      seed: analysis.seed,
      forecastStartYear: analysis.forecastStartYear,
      windowsYears: analysis.windowsYears,
      draws: analysis.draws,
      createdAt: analysis.createdAt.toISOString(),
      finishedAt: analysis.finishedAt?.toISOString() ?? null,
      names: {
        project: await this.provenance.projectName(analysis.projectId),
        segment: (await this.segmentOf(analysis))?.name ?? null,
        site: (await this.siteOf(analysis))?.name ?? null,
        hypothesis: recorded.find((i) => i.kind === 'hypothesis')?.name ?? null,
        ageModelRuns: ageModelRunIds.map((id) => runName.get(id) ?? null),
        jointRun: recorded.find((i) => i.kind === 'jointRun')?.name ?? null,
      },
    };
    const table = eventTableOf(analysis);
    return { json: recurrenceExport(header, results, table), csv: recurrenceExportCsv(header, results, table) };
  }

  /** Two finished analyses side by side (each read with the caller's access), for the screen and the exports. */
  async comparison(user: AuthUser, idA: string, idB: string): Promise<RecurrenceComparison & { analysisA: RecurrenceAnalysisView; analysisB: RecurrenceAnalysisView }> {
    if (idA === idB) throw badInput('analysisBId', 'choose two different analyses to compare');
    const [rowA, rowB] = [await this.get(user, idA), await this.get(user, idB)];
    const side = async (row: RecurrenceAnalysisRow, field: string): Promise<ComparedSide> => {
      const results = row.results as StoredRecurrenceResults | null;
      if (row.status !== 'SUCCEEDED' || !results) throw badInput(field, `analysis ${row.id} has no results to compare (${row.status})`);
      const hypothesis = row.hypothesisId ? await this.analyses.findHypothesis(row.hypothesisId) : undefined;
      return {
        id: row.id,
        segmentId: row.segmentId,
        siteId: row.siteId,
        hypothesisId: row.hypothesisId,
        hypothesisName: hypothesis?.name ?? null,
        hypothesisVersion: row.hypothesisVersion,
        seed: row.seed,
        forecastStartYear: row.forecastStartYear,
        windowsYears: row.windowsYears,
        draws: row.draws,
        results,
        eventTable: eventTableOf(row),
      };
    };
    const comparison = compareAnalyses(await side(rowA, 'analysisAId'), await side(rowB, 'analysisBId'));
    return { ...comparison, analysisA: this.view(rowA), analysisB: this.view(rowB) };
  }

  async comparisonExport(user: AuthUser, idA: string, idB: string): Promise<{ json: RecurrenceComparison; csv: string }> {
    const { analysisA: _a, analysisB: _b, ...json } = await this.comparison(user, idA, idB);
    return { json, csv: recurrenceComparisonCsv(json) };
  }

  segmentOf(analysis: RecurrenceAnalysisRow): Promise<SegmentRow | undefined> {
    return analysis.segmentId ? this.segments.findById(analysis.segmentId) : Promise.resolve(undefined);
  }

  siteOf(analysis: RecurrenceAnalysisRow): Promise<SiteRow | undefined> {
    return analysis.siteId ? this.sites.findById(analysis.siteId) : Promise.resolve(undefined);
  }

  hypothesisOf(analysis: RecurrenceAnalysisRow): Promise<HypothesisRow | undefined> {
    return analysis.hypothesisId ? this.analyses.findHypothesis(analysis.hypothesisId) : Promise.resolve(undefined);
  }

  releaseOf(analysis: RecurrenceAnalysisRow): Promise<ReleaseRow | undefined> {
    return analysis.releaseId ? this.analyses.findRelease(analysis.releaseId) : Promise.resolve(undefined);
  }

  /** A site analysis runs on the joint event draws of the site's newest successful age model run. */
  private async prepareSite(user: AuthUser, siteId: string, input: StartRecurrenceAnalysisInput, forecastStartYear: number) {
    const site = await this.sites.get(user, siteId, Permission.RecurrenceRun);
    if (input.hypothesisId) {
      throw badInput('hypothesisId', 'a site analysis uses the site’s own age model; leave hypothesisId out or give a segment');
    }
    if (input.countingRule) {
      throw badInput('countingRule', 'a site analysis counts every event of the site’s age model; a counting rule applies to a segment');
    }
    const run = await this.ageModelRuns.latestSucceededForSite(site.id);
    const eventDraws = (run?.results as StoredAgeModelResults | null | undefined)?.eventDraws;
    if (!run || !eventDraws) throw badInput('siteId', 'the site has no successful age model run; run its age model first');
    if (eventDraws.eventHorizonIds.length < MINIMUM_EVENTS) {
      throw badInput(
        'siteId',
        `the site's age model has ${eventDraws.eventHorizonIds.length} events; at least ${MINIMUM_EVENTS} are needed (2 closed intervals)`,
      );
    }
    refuseInput(() => checkForecastStart(youngestDrawnAge(eventDraws.draws), forecastStartYear));
    const snapshot: RecurrenceInputSnapshot = {
      kind: 'site',
      siteId: site.id,
      ageModelRunId: run.id,
      eventHorizonIds: eventDraws.eventHorizonIds,
      availableDraws: eventDraws.drawCount,
    };
    return { projectId: site.projectId, snapshot, message: null };
  }

  /**
   * A segment analysis runs on the regional events of a hypothesis recorded at the segment's
   * sites, from each member's newest successful age model posterior.
   */
  private async prepareSegment(user: AuthUser, segmentId: string, input: StartRecurrenceAnalysisInput, forecastStartYear: number) {
    const { segment, hypothesis, eventsInput, onSegment, table, posteriors } = await this.segmentTable(user, {
      segmentId,
      hypothesisId: input.hypothesisId ?? null,
      countingRule: input.countingRule ?? null,
      permission: Permission.RecurrenceRun,
    });
    const chosen = refuseInput(() => segmentRegionalEvents({ ...eventsInput, inclusion: inclusionOf(table) }, onSegment));
    refuseInput(() => checkForecastStart(chosen.regionalEvents[0].density.startCalBp - 0.5, forecastStartYear));
    const memberIds = chosen.regionalEvents.flatMap((event) => event.memberIds);
    const ageModelRunIds = [...new Set(memberIds.map((id) => posteriors.get(id)!.runId))].sort();
    const snapshot: RecurrenceInputSnapshot = {
      kind: 'segment',
      segmentId: segment.id,
      hypothesisId: hypothesis.id,
      hypothesisVersion: hypothesis.version,
      ageModelRunIds,
      regionalEvents: chosen.regionalEvents.map((event) => ({
        id: event.id,
        memberIds: [...event.memberIds],
        siteIds: [...event.siteIds],
        medianCalBp: event.medianCalBp,
        density: storeDensity(event.density),
        inclusionProbability: event.inclusionProbability,
      })),
      skippedTieIds: [...chosen.skippedTieIds],
      orderConflictCount: chosen.orderConflictCount,
      eventTable: table,
      ...(await this.jointSource(hypothesis.id, chosen.regionalEvents.map((event) => event.id))),
    };
    const warnings = [
      chosen.skippedTieIds.length > 0 ? `${chosen.skippedTieIds.length} ties were left out because an event has no age model yet` : null,
      chosen.orderConflictCount > 0 ? `the hypothesis has ${chosen.orderConflictCount} order conflicts among these events` : null,
    ].filter((w): w is string => w !== null);
    return { projectId: segment.projectId, snapshot, message: warnings.length > 0 ? `Queued; note: ${warnings.join('; ')}.` : null };
  }

  /** The segment's event table under a hypothesis (the preferred one by default) and a counting rule. */
  async eventTable(user: AuthUser, input: SegmentEventTableInput): Promise<StoredEventTable> {
    const { table } = await this.segmentTable(user, {
      segmentId: input.segmentId,
      hypothesisId: input.hypothesisId ?? null,
      countingRule: input.countingRule ?? null,
      permission: Permission.ProjectRead,
    });
    return table;
  }

  /**
   * Reads a segment's events under a hypothesis, checks the hypothesis on the whole project and
   * builds the event table under the counting rule (BAD_USER_INPUT naming the rule's field).
   */
  private async segmentTable(
    user: AuthUser,
    request: { segmentId: string; hypothesisId: string | null; countingRule: CountingRuleInput | null; permission: Permission },
  ) {
    const segment = await this.segments.get(user, request.segmentId, request.permission);
    const hypothesis = await this.chooseHypothesis(segment.projectId, request.hypothesisId);
    const [projectEvents, segmentSites, ties, tectonicSetting, projectSegments] = await Promise.all([
      this.analyses.eventsOfProject(segment.projectId),
      this.sites.listForSegment(segment.id),
      this.analyses.tiesOf(hypothesis.id),
      this.analyses.tectonicSetting(segment.projectId),
      this.segments.listForProject(segment.projectId),
    ]);
    const posteriors = await this.latestRuns.posteriorsForSites([...new Set(projectEvents.map((e) => e.siteId))]);
    const events: SiteEvent[] = projectEvents
      .filter((event) => posteriors.has(event.id))
      .map((event) => ({
        id: event.id,
        name: event.name,
        siteId: event.siteId,
        siteName: event.siteName,
        alongStrikeKm: event.alongStrikeKm,
        orderIndexFromBase: event.unitBelowPosition,
        posterior: posteriors.get(event.id)!.density,
      }));
    const eventsInput = { events, ties, tectonicSetting, segmentSiteIds: new Set(segmentSites.map((site) => site.id)) };
    const onSegment = refuseInput(() => hypothesisOnSegment(eventsInput));
    const table = refuseInput(() =>
      segmentEventTable({
        segment,
        segmentSiteKm: segmentSites.map((site) => site.alongStrikeKm),
        hypothesis,
        candidates: onSegment.candidates,
        events: new Map(projectEvents.map((event) => [event.id, event])),
        ties,
        segmentNames: new Map(projectSegments.map((row) => [row.id, row.name])),
        rule: countingRuleOf(request.countingRule),
      }),
    );
    return { segment, hypothesis, eventsInput, onSegment, table, posteriors };
  }

  /** The hypothesis' fresh joint run when it modelled every chosen regional event (source JOINT_RUN); nothing otherwise. */
  private async jointSource(hypothesisId: string, regionalEventIds: string[]): Promise<{ jointRunId?: string; availableDraws?: number }> {
    const fresh = await this.freshJointRuns.forHypothesis(hypothesisId);
    const draws = fresh ? jointSegmentDraws(fresh.results, regionalEventIds) : null;
    return fresh && draws ? { jointRunId: fresh.run.id, availableDraws: draws.drawCount } : {};
  }

  private async chooseHypothesis(projectId: string, hypothesisId: string | null): Promise<HypothesisRow> {
    if (hypothesisId) {
      const hypothesis = await this.analyses.findHypothesis(hypothesisId);
      if (!hypothesis || hypothesis.projectId !== projectId) throw notFound('hypothesis');
      return hypothesis;
    }
    const preferred = await this.analyses.preferredHypothesis(projectId);
    if (!preferred) throw badInput('hypothesisId', 'the project has no preferred hypothesis; choose one');
    return preferred;
  }
}

/** The event table a segment analysis stored with its inputs; null for a site analysis or an older one. */
export function eventTableOf(row: Pick<RecurrenceAnalysisRow, 'inputSnapshot'>): StoredEventTable | null {
  const snapshot = row.inputSnapshot as RecurrenceInputSnapshot | null;
  return snapshot?.kind === 'segment' ? (snapshot.eventTable ?? null) : null;
}

/** Runs a pure step, turning its input errors into BAD_USER_INPUT. */
function refuseInput<T>(step: () => T): T {
  try {
    return step();
  } catch (error) {
    throw asDomainError(error, {});
  }
}

function refuseRange<T>(field: string, step: () => T): T {
  try {
    return step();
  } catch (error) {
    if (error instanceof RangeError) throw badInput(field, error.message);
    throw error;
  }
}

function asDomainError(error: unknown, fields: Record<string, string>): unknown {
  if (error instanceof RecurrenceInputError) return badInput(fields[error.field] ?? error.field, error.message);
  if (error instanceof RangeError) return badInput('input', error.message);
  return error;
}
