import { Injectable } from '@nestjs/common';
import { AccessService } from '../access/access.service';
import { Permission } from '../access/permissions';
import { AuditService } from '../audit/audit.service';
import { CalibrationService } from '../calibration/calibration.service';
import { AuthUser } from '../auth/auth-user';
import { DEFAULT_AGE_MODEL_SETTINGS } from '../chronology/age-model/age-model';
import { DEFAULT_HEMIPELAGIC_RUN_SETTINGS, DEFAULT_HEMIPELAGIC_SETTINGS } from '../chronology/age-model/hemipelagic/hemipelagic-model';
import { AgeModelInput, validateColumn } from '../chronology/age-model/column';
import { hemipelagicProblems } from '../chronology/age-model/hemipelagic/core-depth';
import { asNotFoundOf, badInput, notFound } from '../common/errors/domain-error';
import { DatabaseService } from '../database/database.service';
import { EventHorizonsRepository } from '../event-horizons/event-horizons.repository';
import { JobQueueService } from '../jobs/job-queue.service';
import { DEFAULT_INHERITANCE_SCALE_YEARS } from '../samples/sample-rules';
import { SampleRow, SamplesRepository } from '../samples/samples.repository';
import { calibratedGrid, ReservoirSource, reservoirSources, SampleReservoir } from '../chronology/age-model/reservoir-offsets';
import { SiteRow } from '../sites/sites.repository';
import { SitesService } from '../sites/sites.service';
import { UnitsRepository } from '../units/units.repository';
import { AgeModelRunRow, AgeModelRunsRepository, DownstreamRunChoiceRow } from './age-model-runs.repository';
import { AgeModelJob } from './age-model.job';
import { storeInput } from './age-model-results';
import { ChooseDownstreamRunInput } from './dto/choose-downstream-run.input';
import { StartAgeModelRunInput } from './dto/start-age-model-run.input';

/** Default sweeps per chain for interactive runs: converges for demo-sized columns in seconds. */
export const DEFAULT_ITERATIONS = 20_000;

/**
 * The hemipelagic model's chain settings (an iteration is one sweep of its moves) and its own
 * settings. Thinning keeps at most about 2,000 draws per chain, so a long run does not hold
 * millions of curve points.
 */
function hemipelagicRunSettings(input: Omit<StartAgeModelRunInput, 'siteId'>) {
  const iterations = input.iterations ?? DEFAULT_HEMIPELAGIC_RUN_SETTINGS.iterations;
  return {
    iterations,
    burnIn: DEFAULT_HEMIPELAGIC_RUN_SETTINGS.burnIn,
    thin: Math.max(DEFAULT_HEMIPELAGIC_RUN_SETTINGS.thin, Math.ceil(iterations / 2_000)),
    hemipelagic: { ...DEFAULT_HEMIPELAGIC_SETTINGS, rateMeanCmPerKyr: input.hemipelagicRateCmPerKyr ?? null },
  };
}

@Injectable()
export class AgeModelsService {
  constructor(
    private readonly database: DatabaseService,
    private readonly runs: AgeModelRunsRepository,
    private readonly sites: SitesService,
    private readonly units: UnitsRepository,
    private readonly eventHorizons: EventHorizonsRepository,
    private readonly samples: SamplesRepository,
    private readonly calibration: CalibrationService,
    private readonly jobs: JobQueueService,
    private readonly ageModelJob: AgeModelJob,
    private readonly access: AccessService,
    private readonly audit: AuditService,
  ) {}

  /** Validate the column, snapshot it and queue the run. Column problems are BAD_USER_INPUT before anything is queued. */
  async start(user: AuthUser, input: StartAgeModelRunInput): Promise<AgeModelRunRow> {
    const site = await this.sites.get(user, input.siteId, Permission.AgeModelRun);
    return this.queue(site, input, user);
  }

  /** Queue a run without a user (the demo seed). */
  async queue(site: SiteRow, input: Omit<StartAgeModelRunInput, 'siteId'>, user: AuthUser | null): Promise<AgeModelRunRow> {
    // The revision is read before the column: a change in between makes the run look stale, never fresh.
    const columnRevision = (await this.sites.findById(site.id))?.columnRevision ?? site.columnRevision;
    const { model, fingerprint } = await this.columnOf(site, input.inheritanceScaleYears ?? null);
    const depthModel = input.depthModel ?? 'ORDER_ONLY';
    if (depthModel === 'HEMIPELAGIC_RATE') {
      const unfit = hemipelagicProblems(model);
      if (unfit.length > 0) throw badInput('depthModel', unfit.join('; '), { problems: unfit });
    }
    // The hemipelagic model dates an event from the mud's rate, so it needs no dated level below it.
    const problems = validateColumn(model).filter((p) => depthModel === 'ORDER_ONLY' || p.code !== 'EVENT_NOT_DATED_BELOW');
    if (problems.length > 0) {
      throw badInput('siteId', `the column cannot be modelled: ${problems.map((p) => p.message).join('; ')}`, {
        problems: problems.map((p) => p.message),
      });
    }
    const settings = {
      ...DEFAULT_AGE_MODEL_SETTINGS,
      iterations: input.iterations ?? DEFAULT_ITERATIONS,
      chains: input.chains ?? DEFAULT_AGE_MODEL_SETTINGS.chains,
      outlierPrior: input.outlierPrior ?? DEFAULT_AGE_MODEL_SETTINGS.outlierPrior,
      outlierShiftScaleYears: input.outlierShiftScaleYears ?? DEFAULT_AGE_MODEL_SETTINGS.outlierShiftScaleYears,
      inheritanceScaleYears: input.inheritanceScaleYears ?? DEFAULT_AGE_MODEL_SETTINGS.inheritanceScaleYears,
      seed: input.seed ?? Math.floor(Math.random() * 2 ** 31),
      depthModel,
      ...(depthModel === 'HEMIPELAGIC_RATE' ? hemipelagicRunSettings(input) : {}),
    };
    const run = await this.database.transaction(async (tx) => {
      const row = await this.runs.insert(
        { siteId: site.id, requestedById: user?.id ?? null, seed: settings.seed, settings, inputSnapshot: storeInput(model), inputFingerprint: fingerprint, columnRevision },
        tx,
      );
      await this.audit.record(tx, {
        actor: user, projectId: site.projectId, action: 'run', objectType: 'ageModelRun', objectId: row.id, after: { siteId: site.id, settings },
      });
      return row;
    });
    await this.jobs.send(this.ageModelJob, { runId: run.id });
    return run;
  }

  async get(user: AuthUser, id: string): Promise<AgeModelRunRow> {
    const run = await this.runs.findById(id);
    if (!run) throw notFound('age model run');
    await asNotFoundOf('age model run', () => this.sites.get(user, run.siteId));
    return run;
  }

  async cancel(user: AuthUser, id: string): Promise<AgeModelRunRow> {
    const run = await this.runs.findById(id);
    if (!run) throw notFound('age model run');
    const site = await asNotFoundOf('age model run', () => this.sites.get(user, run.siteId, Permission.AgeModelRun));
    const cancelled = await this.runs.cancel(id);
    if (!cancelled) throw badInput('id', `the run has already ended (${run.status})`);
    await this.audit.record(this.database.db, { actor: user, projectId: site.projectId, action: 'cancel', objectType: 'ageModelRun', objectId: id });
    return cancelled;
  }

  /**
   * Choose which successful run of a site feeds everything downstream (`downstream-runs.ts`), or
   * with no `runId` go back to the newest successful run. Who may start the site's runs may choose
   * among them. The run must be a SUCCEEDED run of this very site: anything else (a run of
   * another site or project, an unknown id, a run that failed, was cancelled or has not ended) is
   * BAD_USER_INPUT on `runId` and changes nothing. The write bumps the project revision (trigger),
   * so cached ladders go; results that used the run fed downstream before report stale.
   */
  async chooseDownstreamRun(user: AuthUser, input: ChooseDownstreamRunInput): Promise<SiteRow> {
    const site = await this.sites.get(user, input.siteId, Permission.AgeModelRun);
    const runId = input.runId ?? null;
    if (runId !== null) {
      const run = await this.runs.findById(runId);
      // Another site's or project's run reads as "not a run of this site": its existence is not told.
      if (!run || run.siteId !== site.id) throw badInput('runId', `not an age model run of site ${site.name}`);
      if (run.status !== 'SUCCEEDED') {
        throw badInput('runId', `only a successful run can be used downstream; this run is ${run.status.toLowerCase()}`);
      }
    }
    await this.database.transaction(async (tx) => {
      const before = (await this.runs.choiceOf(site.id, tx)) ?? null;
      if ((before?.ageModelRunId ?? null) === runId) return;
      const after = runId === null ? (await this.runs.deleteChoice(site.id, tx), null) : await this.runs.saveChoice({ siteId: site.id, ageModelRunId: runId, chosenById: user.id }, tx);
      await this.audit.record(tx, {
        actor: user, projectId: site.projectId, action: after ? 'update' : 'delete', objectType: 'downstreamRunChoice', objectId: site.id,
        before: before && choiceImage(before), after: after && choiceImage(after),
      });
    });
    return site;
  }

  /** A site's chosen run; undefined when it follows its newest successful run. */
  choiceOf(siteId: string): Promise<DownstreamRunChoiceRow | undefined> {
    return this.runs.choiceOf(siteId);
  }

  choicesOfProject(projectId: string): Promise<DownstreamRunChoiceRow[]> {
    return this.runs.choicesOfProject(projectId);
  }

  /** The run a site uses downstream (`downstream-runs.ts`), with its results. */
  downstreamRunOf(siteId: string): Promise<AgeModelRunRow | undefined> {
    return this.runs.latestSucceededForSite(siteId);
  }

  newestSucceededId(siteId: string): Promise<string | undefined> {
    return this.runs.newestSucceededId(siteId);
  }

  /**
   * A refresh re-ran a chosen run (same settings and seed on today's column) and the fresh run
   * succeeded: the choice moves to it, so the researcher's choice holds on the new column. Audited
   * as the refresh's requester's change; nothing when the stale run was not (or no longer) chosen.
   */
  async carryChoice(actor: AuthUser | null, staleRunId: string, freshRunId: string): Promise<void> {
    await this.database.transaction(async (tx) => {
      const moved = await this.runs.moveChoice(staleRunId, freshRunId, tx);
      if (!moved) return;
      const site = await this.sites.findById(moved.siteId);
      await this.audit.record(tx, {
        actor, projectId: site?.projectId ?? null, action: 'update', objectType: 'downstreamRunChoice', objectId: moved.siteId,
        before: { ageModelRunId: staleRunId }, after: { ...choiceImage(moved), carriedByRefresh: true },
      });
    });
  }

  listForSite(siteId: string): Promise<AgeModelRunRow[]> {
    return this.runs.listForSite(siteId);
  }

  latestForSite(siteId: string): Promise<AgeModelRunRow | undefined> {
    return this.runs.latestForSite(siteId);
  }

  /**
   * The model input of a site's current column (sample densities recomputed), with its fingerprint;
   * joint runs build theirs with it too. Each sample's offset scale is its own, else the run's
   * `inheritanceScaleYears` when the run gives one, else the default for its material
   * (`DEFAULT_INHERITANCE_SCALE_YEARS`).
   */
  async columnOf(site: SiteRow, runInheritanceScale: number | null): Promise<{ model: AgeModelInput; fingerprint: string }> {
    const [units, eventHorizons, samples, fingerprints] = await Promise.all([
      this.units.listForSite(site.id),
      this.eventHorizons.listForSite(site.id),
      this.samples.listForSite(site.id),
      this.runs.columnFingerprints([site.id]),
    ]);
    const fingerprint = fingerprints.get(site.id)!;
    const marineCurves = new Set((await this.calibration.listCurves()).filter((c) => c.marine).map((c) => c.code));
    const isMarineCurveCode = (code: string) => marineCurves.has(code);
    const grouping = reservoirSources(
      samples
        .filter((s) => s.calibration && !s.excluded && s.method === 'RADIOCARBON' && s.curve !== null && isMarineCurveCode(s.curve) && s.deltaR !== null)
        .map((s) => ({ id: s.id, name: s.labCode, deltaR: s.deltaR!, deltaRError: s.deltaRError ?? 0, source: s.deltaRSource ?? null })),
    );
    if (grouping.problems.length > 0) throw badInput('deltaRSource', grouping.problems.join('; '), { problems: grouping.problems });
    const reservoirs = await this.reservoirsOf(samples, grouping.keyOf, grouping.sources);
    const model: AgeModelInput = {
      units: units.map((u) => ({
        id: u.id, name: u.name, position: u.position, topDepthM: u.topDepthM, baseDepthM: u.baseDepthM, facies: u.facies, basalErosionM: u.basalErosionM,
      })),
      eventHorizons: eventHorizons.map((h) => ({ id: h.id, name: h.name, unitBelowId: h.unitBelowId, unitAboveId: h.unitAboveId })),
      samples: await Promise.all(
        samples
          .filter((s) => s.calibration)
          .map(async (s) => ({
            ...(reservoirs.bySample.has(s.id) ? { reservoir: reservoirs.bySample.get(s.id)! } : {}),
            id: s.id,
            name: s.labCode,
            unitId: s.unitId,
            depthM: s.depthM,
            ageRelation: s.ageRelation,
            excluded: s.excluded,
            offsetScaleYears: s.inheritanceScaleYears ?? runInheritanceScale ?? DEFAULT_INHERITANCE_SCALE_YEARS[s.material],
            likelihood: await this.calibration.densityOfSample(s),
          })),
      ),
      orderSamplesByDepth: site.kind === 'CORE',
      ...(reservoirs.sources.length > 0 ? { reservoirSources: reservoirs.sources } : {}),
    };
    return { model, fingerprint };
  }

  /**
   * Each marine sample's part in its source's shared offset: its calibration at each Delta-R of the
   * source's grid with no Delta-R error (the offset carries it), the grid kept to the values at
   * which every sample of the source calibrates (`calibratedGrid`).
   */
  private async reservoirsOf(samples: readonly SampleRow[], keyOf: Map<string, string>, sources: readonly ReservoirSource[]) {
    const bySample = new Map<string, SampleReservoir>();
    const kept: ReservoirSource[] = [];
    for (const source of sources) {
      const members = samples.filter((s) => keyOf.get(s.id) === source.key);
      if (members.length === 0) continue;
      const grids = await Promise.all(members.map((s) => this.calibration.reservoirGridOfSample(s, source.grid)));
      const restricted = calibratedGrid(source, grids);
      if (restricted.source.grid.length < 2) continue;
      kept.push(restricted.source);
      members.forEach((s, i) => {
        const grid = restricted.perSample[i];
        bySample.set(s.id, { sourceKey: source.key, gridLikelihoods: grid.map((g) => g.density), gridLogMass: grid.map((g) => g.logMass) });
      });
    }
    return { bySample, sources: kept };
  }
}

function choiceImage(choice: DownstreamRunChoiceRow) {
  return { siteId: choice.siteId, ageModelRunId: choice.ageModelRunId, chosenById: choice.chosenById, chosenAt: choice.chosenAt };
}
