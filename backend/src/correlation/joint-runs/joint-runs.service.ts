import { Injectable } from '@nestjs/common';
import { Permission } from '../../access/permissions';
import { AgeModelsService } from '../../age-models/age-models.service';
import { AuditService } from '../../audit/audit.service';
import { AuthUser } from '../../auth/auth-user';
import { validateColumn } from '../../chronology/age-model/column';
import { hemipelagicProblems } from '../../chronology/age-model/hemipelagic/core-depth';
import type { JointDepthModel, JointModelInput, JointSiteInput } from '../../chronology/joint-age-model/types';
import { asNotFoundOf, badInput, notFound } from '../../common/errors/domain-error';
import { DatabaseService } from '../../database/database.service';
import { JobQueueService } from '../../jobs/job-queue.service';
import { ProvenanceService } from '../../provenance/provenance.service';
import type { SiteRow } from '../../sites/sites.repository';
import { SitesService } from '../../sites/sites.service';
import type { HypothesisRow } from '../hypotheses.repository';
import { HypothesesService } from '../hypotheses.service';
import { StartJointAgeModelRunInput } from './dto/start-joint-age-model-run.input';
import { JointChainJob } from './joint-chain.job';
import { JOINT_RUN_LIMITS, jointRunSettings, type JointRunSettings } from './joint-run-settings';
import { JointRunSettler } from './joint-run-settler';
import { storeJointInput } from './joint-run-storage';
import { JointRunRow, JointRunsRepository } from './joint-runs.repository';

/** Order loops named in a refusal; the rest are counted. */
const LOOPS_NAMED = 3;

/**
 * Joint age model runs of a hypothesis (issue 13): the input built from the stored columns the
 * way site runs build theirs, refused while the hypothesis has an order loop, queued as one job
 * per chain, with its inputs recorded for staleness and refresh.
 */
@Injectable()
export class JointRunsService {
  constructor(
    private readonly database: DatabaseService,
    private readonly repository: JointRunsRepository,
    private readonly hypotheses: HypothesesService,
    private readonly sites: SitesService,
    private readonly ageModels: AgeModelsService,
    private readonly provenance: ProvenanceService,
    private readonly jobs: JobQueueService,
    private readonly chainJob: JointChainJob,
    private readonly settler: JointRunSettler,
    private readonly audit: AuditService,
  ) {}

  /** Check the hypothesis and every column it ties, snapshot them and queue the chains. Problems are BAD_USER_INPUT before anything is queued. */
  async start(user: AuthUser, input: StartJointAgeModelRunInput): Promise<JointRunRow> {
    const hypothesis = await this.hypotheses.get(user, input.hypothesisId, Permission.CorrelationWrite);
    return this.queue(user, hypothesis, input);
  }

  /** Queue a run of `hypothesis` (also the refresh's re-run, with the stale run's settings and seed). */
  async queue(user: AuthUser | null, hypothesis: HypothesisRow, input: Omit<StartJointAgeModelRunInput, 'hypothesisId'>): Promise<JointRunRow> {
    const chains = input.chains ?? JOINT_RUN_LIMITS.chains.default;
    const iterations = input.iterations ?? JOINT_RUN_LIMITS.iterations.default;
    // Revisions and the version are read before the columns and ties: a change in between makes the run look stale, never fresh.
    const projectSites = await this.sites.listForProject(hypothesis.projectId);
    const { model, siteIds } = await this.modelInput(hypothesis, projectSites);
    const settings: JointRunSettings = jointRunSettings(chains, iterations);
    const seed = input.seed ?? Math.floor(Math.random() * 2 ** 31);
    const run = await this.database.transaction(async (tx) => {
      const row = await this.repository.insertRun(
        { projectId: hypothesis.projectId, hypothesisId: hypothesis.id, hypothesisVersion: hypothesis.version, requestedById: user?.id ?? null, seed, settings, inputSnapshot: storeJointInput(model) },
        tx,
      );
      const chainRows = await this.repository.insertChains(row.id, chains, tx);
      await this.provenance.record(tx, hypothesis.projectId, { kind: 'jointRun', id: row.id }, [
        { kind: 'hypothesis', id: hypothesis.id, revision: hypothesis.version },
        ...projectSites.filter((s) => siteIds.has(s.id)).map((s) => ({ kind: 'site' as const, id: s.id, revision: s.columnRevision })),
      ]);
      await this.audit.record(tx, {
        actor: user, projectId: hypothesis.projectId, action: 'run', objectType: 'jointAgeModelRun', objectId: row.id,
        after: { hypothesisId: hypothesis.id, hypothesisVersion: hypothesis.version, seed, settings, sites: model.sites.map((s) => ({ siteId: s.siteId, depthModel: s.depthModel })) },
      });
      return { row, chainIds: chainRows.map((c) => c.id) };
    });
    for (const chainId of run.chainIds) await this.jobs.send(this.chainJob, { runId: chainId });
    return run.row;
  }

  /** A run the caller may read; NOT_FOUND for non-members. A run whose chains all ended is settled first. */
  async get(user: AuthUser, id: string, permission = Permission.ProjectRead): Promise<JointRunRow> {
    const run = await this.repository.findRun(id);
    if (!run) throw notFound('joint age model run');
    await asNotFoundOf('joint age model run', () => this.hypotheses.get(user, run.hypothesisId, permission));
    return this.settled(run);
  }

  async cancel(user: AuthUser, id: string): Promise<JointRunRow> {
    const run = await this.get(user, id, Permission.CorrelationWrite);
    const cancelled = await this.database.transaction(async (tx) => {
      const row = await this.repository.cancelRun(id, tx);
      if (row) await this.audit.record(tx, { actor: user, projectId: row.projectId, action: 'cancel', objectType: 'jointAgeModelRun', objectId: id });
      return row;
    });
    if (!cancelled) throw badInput('id', `the run has already ended (${run.status})`);
    return cancelled;
  }

  /** The hypothesis' newest run (any status); the parent was authorised. */
  async latestForHypothesis(hypothesisId: string): Promise<JointRunRow | null> {
    const run = await this.repository.latestForHypothesis(hypothesisId);
    return run ? this.settled(run) : null;
  }

  /**
   * An open run read again after settling, when every chain has ended: so a run whose worker
   * died between a chain's end and its settling still finishes.
   */
  private async settled(run: JointRunRow): Promise<JointRunRow> {
    if (run.status !== 'QUEUED' && run.status !== 'RUNNING') return run;
    const chains = await this.repository.chainStates(run.id);
    if (chains.length === 0 || chains.some((c) => c.status === 'QUEUED' || c.status === 'RUNNING')) return run;
    await this.settler.settle(run.id);
    return (await this.repository.findRun(run.id)) ?? run;
  }

  /**
   * The joint model's input: every site with an event tied by the hypothesis (its column as the
   * site age model takes it, its depth model), and every regional event with a member there (an
   * untied event of such a site is a regional event of one). Refused while the hypothesis has an
   * order loop, or a column cannot be modelled.
   */
  private async modelInput(hypothesis: HypothesisRow, projectSites: readonly SiteRow[]): Promise<{ model: JointModelInput; siteIds: Set<string> }> {
    const checks = await this.hypotheses.checksOf(hypothesis);
    if (checks.orderConflicts.length > 0) {
      const loops = checks.orderConflicts;
      const named = loops.slice(0, LOOPS_NAMED).map((loop) => loop.message).join(' ');
      const more = loops.length > LOOPS_NAMED ? ` (and ${loops.length - LOOPS_NAMED} more)` : '';
      throw badInput(
        'hypothesisId',
        `hypothesis "${hypothesis.name}" has ${loops.length} order ${loops.length === 1 ? 'loop' : 'loops'}, so no one chronology can hold all its ties; remove or change a tie on each loop first. ${named}${more}`,
        // The words name sites and events; the ids are here, one list per loop.
        { regionalEventIds: loops.map((loop) => [...loop.regionalEventIds]), tieIds: loops.map((loop) => loop.ties.map((tie) => tie.id)) },
      );
    }
    const tied = checks.regionalEvents.filter((r) => r.members.length > 1);
    if (tied.length === 0) throw badInput('hypothesisId', `hypothesis "${hypothesis.name}" ties no events yet; a joint run needs at least one tie`);
    const siteIds = new Set(tied.flatMap((r) => r.members.map((m) => m.siteId)));
    const sites = projectSites.filter((s) => siteIds.has(s.id));
    const siteInputs: JointSiteInput[] = [];
    for (const site of sites) {
      const { model } = await this.ageModels.columnOf(site, null);
      const depthModel = await this.depthModelOf(site, hemipelagicProblems(model).length === 0);
      const problems = validateColumn(model).filter((p) => depthModel === 'ORDER_ONLY' || p.code !== 'EVENT_NOT_DATED_BELOW');
      if (problems.length > 0) {
        throw badInput('hypothesisId', `the column of site ${site.name} cannot be modelled: ${problems.map((p) => p.message).join('; ')}`, {
          siteId: site.id,
          problems: problems.map((p) => p.message),
        });
      }
      siteInputs.push({ siteId: site.id, siteName: site.name, column: model, depthModel });
    }
    const regionalEvents = checks.regionalEvents
      .filter((r) => r.members.some((m) => siteIds.has(m.siteId)))
      .map((r) => ({
        regionalEventId: r.id,
        name: r.members.map((m) => m.name).join(' + '),
        members: r.members.map((m) => ({ siteId: m.siteId, eventHorizonId: m.id })),
      }));
    return { model: { sites: siteInputs, regionalEvents }, siteIds };
  }

  /** The depth model of the site's latest run; a core without one uses the hemipelagic model when its column fits it. */
  private async depthModelOf(site: SiteRow, hemipelagicFits: boolean): Promise<JointDepthModel> {
    const latest = await this.ageModels.latestForSite(site.id);
    const chosen = (latest?.settings as { depthModel?: JointDepthModel } | undefined)?.depthModel ?? (site.kind === 'CORE' ? 'HEMIPELAGIC_RATE' : 'ORDER_ONLY');
    return chosen === 'HEMIPELAGIC_RATE' && hemipelagicFits ? 'HEMIPELAGIC_RATE' : 'ORDER_ONLY';
  }
}
