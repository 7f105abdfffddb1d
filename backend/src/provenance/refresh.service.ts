import { Injectable, Logger } from '@nestjs/common';
import { AccessService } from '../access/access.service';
import { Permission, Role, roleAllows } from '../access/permissions';
import { AgeModelsService } from '../age-models/age-models.service';
import { AuditService } from '../audit/audit.service';
import { AuthUser } from '../auth/auth-user';
import { DomainError, notFound } from '../common/errors/domain-error';
import { DatabaseService } from '../database/database.service';
import { eventTableOf, RecurrenceService } from '../recurrence/recurrence.service';
import { SitesService } from '../sites/sites.service';
import { ProvenanceService } from './provenance.service';
import { RefreshPlanRow, RefreshRepository, RefreshStepRow } from './refresh.repository';
import { resultKey, type ResultKind } from './staleness';

/** A stale result the requester's role may not re-run, or that cannot be re-run now. */
export interface SkippedRefresh {
  kind: ResultKind;
  id: string;
  label: string;
  reason: string;
}

/**
 * A kind of result the refresh can re-run besides site runs and analyses (joint runs plug in
 * here): its stage between them, the permission to start one, the project's stale ones with the
 * sites they need, and how to queue a fresh one with the same settings and seed.
 */
export interface RefreshableKind {
  readonly kind: ResultKind;
  /** 2 for joint runs: after site runs (1), before analyses (3). */
  readonly stage: number;
  readonly permission: Permission;
  /** What people call it ("joint age model run"). */
  readonly label: string;
  /** The project's current results of this kind that are stale, with the sites whose runs they need first. */
  staleResults(projectId: string): Promise<{ id: string; label: string; siteIds: string[] }[]>;
  /** Queue a fresh result like the stale one (same settings and seed); returns its id. */
  rerun(user: AuthUser, staleId: string): Promise<string>;
  /** Statuses (QUEUED, RUNNING, SUCCEEDED, FAILED, CANCELLED) and messages of fresh results. */
  statuses(ids: readonly string[]): Promise<Map<string, { status: string; message: string | null }>>;
}

/** Seconds without a change before an automatic refresh starts, unless the project says otherwise. */
export const DEFAULT_DEBOUNCE_SECONDS = 60;

const STAGE = { ageModelRun: 1, recurrenceAnalysis: 3 } as const;
const ROLES_FOR: Record<string, string> = {
  [Permission.AgeModelRun]: 'RESEARCHER or ADMIN',
  [Permission.CorrelationWrite]: 'CORRELATOR or ADMIN',
  [Permission.RecurrenceRun]: 'ANALYST or ADMIN',
};

interface PlannedStep {
  key: string;
  stage: number;
  resultKind: ResultKind;
  staleId: string;
  label: string;
  dependsOnKeys: string[];
}

/**
 * One action that brings a project's stale results up to date: finds the current results that are
 * stale, plans fresh ones in dependency order (site age model runs, then joint runs, then
 * recurrence analyses) with the same settings and seeds, and starts each step once every step it
 * needs has succeeded. A failed step stops only the steps that depend on it.
 */
@Injectable()
export class RefreshService {
  private readonly logger = new Logger(RefreshService.name);
  private readonly extraKinds: RefreshableKind[] = [];

  constructor(
    private readonly database: DatabaseService,
    private readonly repository: RefreshRepository,
    private readonly provenance: ProvenanceService,
    private readonly access: AccessService,
    private readonly audit: AuditService,
    private readonly sites: SitesService,
    private readonly ageModels: AgeModelsService,
    private readonly recurrence: RecurrenceService,
  ) {}

  /** Add a kind of result (joint runs) to what the refresh re-runs. */
  register(kind: RefreshableKind): void {
    this.extraKinds.push(kind);
  }

  /** Plan and start the refresh of a project's stale results, as far as the caller's role may. */
  async refresh(user: AuthUser, projectId: string, automatic = false) {
    const role = await this.access.requireAccess({ user, permission: Permission.ResultsRefresh, projectId });
    const { steps, skipped } = await this.plan(projectId, role);
    const plan = await this.database.transaction(async (tx) => {
      const row = await this.repository.insertPlan({ projectId, requestedById: user.id, automatic, skipped, status: steps.length > 0 ? 'ACTIVE' : 'FINISHED' }, tx);
      const ids = new Map<string, string>();
      // Insert stage by stage so each step can name the ids of the steps it waits for.
      for (const stage of [...new Set(steps.map((s) => s.stage))].sort()) {
        const inserted = await this.repository.insertSteps(
          steps.filter((s) => s.stage === stage).map((s) => ({ planId: row.id, stage: s.stage, resultKind: s.resultKind, staleId: s.staleId, label: s.label, dependsOn: s.dependsOnKeys.map((k) => ids.get(k)!) })),
          tx,
        );
        for (const step of inserted) ids.set(resultKey(step.resultKind as ResultKind, step.staleId), step.id);
      }
      await this.audit.record(tx, {
        actor: user, projectId, action: 'run', objectType: 'refreshPlan', objectId: row.id,
        after: { automatic, steps: steps.map((s) => ({ kind: s.resultKind, staleId: s.staleId, label: s.label })), skipped },
      });
      return row;
    });
    await this.advance(plan.id);
    return plan;
  }

  /** The plan as stored; NOT_FOUND for non-members. */
  async get(user: AuthUser, id: string): Promise<RefreshPlanRow> {
    const plan = /^[0-9a-f-]{36}$/i.test(id) ? await this.repository.findPlan(id) : undefined;
    if (!plan) throw notFound('refresh plan');
    await this.access.requireAccess({ user, permission: Permission.ProjectRead, projectId: plan.projectId, objectName: 'refresh plan' });
    return plan;
  }

  stepsOf(planId: string): Promise<RefreshStepRow[]> {
    return this.repository.stepsOf(planId);
  }

  plansOf(projectId: string): Promise<RefreshPlanRow[]> {
    return this.repository.plansOfProject(projectId, 10);
  }

  async settings(projectId: string): Promise<{ automatic: boolean; debounceSeconds: number }> {
    const row = await this.repository.settingsOf(projectId);
    return { automatic: row?.automatic ?? false, debounceSeconds: row?.debounceSeconds ?? DEFAULT_DEBOUNCE_SECONDS };
  }

  async setSettings(user: AuthUser, input: { projectId: string; automatic: boolean; debounceSeconds?: number | null }) {
    await this.access.requireAccess({ user, permission: Permission.ProjectSettings, projectId: input.projectId });
    const before = await this.settings(input.projectId);
    const debounceSeconds = input.debounceSeconds ?? before.debounceSeconds;
    return this.database.transaction(async (tx) => {
      const row = await this.repository.saveSettings({ projectId: input.projectId, automatic: input.automatic, debounceSeconds, updatedById: user.id }, tx);
      await this.audit.record(tx, {
        actor: user, projectId: input.projectId, action: 'update', objectType: 'refreshSettings', objectId: input.projectId,
        before, after: { automatic: row.automatic, debounceSeconds: row.debounceSeconds },
      });
      return { automatic: row.automatic, debounceSeconds: row.debounceSeconds };
    });
  }

  /**
   * The automatic refresh: for each project that asked for it, once nothing has changed for its
   * debounce time and no refresh is active, refresh as the member who turned it on.
   */
  async refreshAutomatically(now = new Date()): Promise<void> {
    for (const settings of await this.repository.automaticProjects()) {
      // Every API replica ticks: the project's advisory lock lets one of them decide and start, and
      // the next one to get it sees that plan (newer than the last change) and does nothing.
      await this.database
        .transaction(async (tx) => {
          if (!(await this.repository.tryAutomaticRefreshLock(settings.projectId, tx))) return;
          const [latest] = await this.repository.plansOfProject(settings.projectId, 1);
          if (latest?.status === 'ACTIVE') return;
          const changedAt = await this.repository.lastChangeAt(settings.projectId);
          if (!changedAt || (latest && latest.createdAt >= changedAt)) return;
          if (now.getTime() - changedAt.getTime() < settings.debounceSeconds * 1000) return;
          const user = await this.repository.user(settings.updatedById);
          if (!user) return;
          await this.refresh(user, settings.projectId, true);
        })
        .catch((error: unknown) =>
          this.logger.warn(`automatic refresh of project ${settings.projectId}: ${error instanceof Error ? error.message : String(error)}`),
        );
    }
  }

  /** Advance every active plan (called on a timer). */
  async advanceAll(): Promise<void> {
    for (const plan of await this.repository.activePlans()) {
      await this.advance(plan.id).catch((error: unknown) => this.logger.warn(`refresh plan ${plan.id}: ${error instanceof Error ? error.message : String(error)}`));
    }
  }

  /**
   * Move a plan on: record finished fresh results, block steps whose dependencies failed, start
   * steps whose dependencies all succeeded. Safe to call from several processes at once: every
   * move is conditional on the step's status.
   */
  async advance(planId: string): Promise<void> {
    const plan = await this.repository.findPlan(planId);
    if (!plan || plan.status !== 'ACTIVE') return;
    let steps = await this.repository.stepsOf(planId);
    // 1. Queued steps whose fresh result ended.
    for (const kind of new Set(steps.filter((s) => s.status === 'QUEUED').map((s) => s.resultKind))) {
      const queued = steps.filter((s) => s.status === 'QUEUED' && s.resultKind === kind && s.freshId);
      const statuses = await this.statusesOf(kind as ResultKind, queued.map((s) => s.freshId!));
      for (const step of queued) {
        const fresh = statuses.get(step.freshId!);
        if (!fresh || fresh.status === 'FAILED' || fresh.status === 'CANCELLED') {
          await this.repository.moveStep(step.id, 'QUEUED', { status: 'FAILED', message: fresh?.message ?? 'the fresh result was deleted', finishedAt: new Date() });
        } else if (fresh.status === 'SUCCEEDED') {
          // A chosen site run re-run on today's column: the choice moves to the fresh run before
          // the analyses waiting for it start, so they read it (and the choice holds).
          if (kind === 'ageModelRun') await this.ageModels.carryChoice(await this.repository.user(plan.requestedById) ?? null, step.staleId, step.freshId!);
          await this.repository.moveStep(step.id, 'QUEUED', { status: 'SUCCEEDED', finishedAt: new Date() });
        }
      }
    }
    // 2. Waiting steps, in stage order so a block or start is seen by later stages at once.
    steps = await this.repository.stepsOf(planId);
    const byId = new Map(steps.map((s) => [s.id, s]));
    const user = await this.repository.user(plan.requestedById);
    for (const step of steps.filter((s) => s.status === 'WAITING').sort((a, b) => a.stage - b.stage)) {
      const needs = step.dependsOn.map((id) => byId.get(id)!);
      const failed = needs.find((n) => n.status === 'FAILED' || n.status === 'BLOCKED');
      if (failed) {
        if (await this.repository.moveStep(step.id, 'WAITING', { status: 'BLOCKED', message: `not started: ${failed.label} ${failed.status === 'FAILED' ? 'failed' : 'was not started'}`, finishedAt: new Date() })) {
          byId.set(step.id, { ...step, status: 'BLOCKED' });
        }
        continue;
      }
      if (!needs.every((n) => n.status === 'SUCCEEDED')) continue;
      if (!(await this.repository.moveStep(step.id, 'WAITING', { status: 'STARTING', startedAt: new Date() }))) continue;
      try {
        if (!user) throw new DomainError('NOT_FOUND', 'the member who asked for the refresh no longer exists');
        const freshId = await this.rerun(user, step);
        await this.repository.moveStep(step.id, 'STARTING', { status: 'QUEUED', freshId });
        byId.set(step.id, { ...step, status: 'QUEUED', freshId });
      } catch (error) {
        const message = error instanceof Error ? error.message : String(error);
        await this.repository.moveStep(step.id, 'STARTING', { status: 'FAILED', message: `could not start: ${message}`, finishedAt: new Date() });
        byId.set(step.id, { ...step, status: 'FAILED' });
      }
    }
    const open = (await this.repository.stepsOf(planId)).some((s) => ['WAITING', 'STARTING', 'QUEUED'].includes(s.status));
    if (!open) await this.repository.finishPlan(planId);
  }

  /** The steps for the project's stale results that the role may start, and what it skips. */
  private async plan(projectId: string, role: Role): Promise<{ steps: PlannedStep[]; skipped: SkippedRefresh[] }> {
    const may = (permission: Permission) => roleAllows(role, permission);
    const steps: PlannedStep[] = [];
    const skipped: SkippedRefresh[] = [];
    const skip = (kind: ResultKind, id: string, label: string, reason: string) => skipped.push({ kind, id, label, reason });

    // Stage 1: each site's run used downstream (chosen, else newest successful), when its column changed since.
    const siteRuns = (await this.repository.latestSiteRuns(projectId)).filter((r) => r.columnRevision !== r.siteRevision);
    const alreadyRunning = await this.repository.sitesBeingRun(siteRuns.map((r) => r.siteId));
    const siteStep = new Map<string, string>();
    const blockedSites = new Set<string>();
    for (const run of siteRuns) {
      const label = `age model of ${run.siteName}`;
      if (alreadyRunning.has(run.siteId)) {
        skip('ageModelRun', run.id, label, 'a run of the current column is already queued or running');
        blockedSites.add(run.siteId);
      } else if (!may(Permission.AgeModelRun)) {
        skip('ageModelRun', run.id, label, `your role (${role}) cannot run age models; a ${ROLES_FOR[Permission.AgeModelRun]} can`);
        blockedSites.add(run.siteId);
      } else {
        const key = resultKey('ageModelRun', run.id);
        steps.push({ key, stage: STAGE.ageModelRun, resultKind: 'ageModelRun', staleId: run.id, label, dependsOnKeys: [] });
        siteStep.set(run.siteId, key);
      }
    }

    // Stage 2: joint runs and any other registered kind.
    const extraStep = new Map<string, string>();
    for (const kind of this.extraKinds) {
      for (const result of await kind.staleResults(projectId)) {
        const needs = result.siteIds.filter((id) => siteStep.has(id)).map((id) => siteStep.get(id)!);
        const key = resultKey(kind.kind, result.id);
        if (!may(kind.permission)) skip(kind.kind, result.id, result.label, `your role (${role}) cannot start a ${kind.label}; a ${ROLES_FOR[kind.permission] ?? 'ADMIN'} can`);
        else if (result.siteIds.some((id) => blockedSites.has(id))) skip(kind.kind, result.id, result.label, 'a site age model it needs is stale and not refreshed by you');
        else {
          steps.push({ key, stage: kind.stage, resultKind: kind.kind, staleId: result.id, label: result.label, dependsOnKeys: needs });
          extraStep.set(result.id, key);
        }
      }
    }

    // Stage 3: the current analyses that are stale.
    const analyses = await this.repository.latestAnalyses(projectId);
    const staleness = await this.provenance.staleness(analyses.map((a) => ({ kind: 'recurrenceAnalysis' as const, id: a.id })));
    for (const analysis of analyses) {
      if ((staleness.get(resultKey('recurrenceAnalysis', analysis.id)) ?? []).length === 0) continue;
      const recorded = await this.provenance.inputsOf({ kind: 'recurrenceAnalysis', id: analysis.id });
      const runSites = (await this.provenance.runSites(recorded.filter((i) => i.kind === 'ageModelRun').map((i) => i.id)));
      const segmentSites = analysis.segmentId ? await this.repository.siteIdsOfSegment(analysis.segmentId) : [];
      const siteIds = [...new Set([...runSites, ...segmentSites, ...(analysis.siteId ? [analysis.siteId] : [])])];
      const label = await this.analysisLabel(analysis, recorded);
      if (!may(Permission.RecurrenceRun)) {
        skip('recurrenceAnalysis', analysis.id, label, `your role (${role}) cannot run recurrence analyses; an ${ROLES_FOR[Permission.RecurrenceRun]} can`);
        continue;
      }
      if (siteIds.some((id) => blockedSites.has(id))) {
        skip('recurrenceAnalysis', analysis.id, label, 'an age model it uses is stale and not refreshed by you; refresh after it is re-run');
        continue;
      }
      const needs = [
        ...siteIds.filter((id) => siteStep.has(id)).map((id) => siteStep.get(id)!),
        ...recorded.filter((i) => i.kind === 'jointRun' && extraStep.has(i.id)).map((i) => extraStep.get(i.id)!),
      ];
      steps.push({ key: resultKey('recurrenceAnalysis', analysis.id), stage: STAGE.recurrenceAnalysis, resultKind: 'recurrenceAnalysis', staleId: analysis.id, label, dependsOnKeys: needs });
    }
    return { steps, skipped };
  }

  private async analysisLabel(analysis: { segmentId: string | null; siteId: string | null }, recorded: { kind: string; name: string; revision: number | null }[]): Promise<string> {
    const hypothesis = recorded.find((i) => i.kind === 'hypothesis');
    if (analysis.siteId) return `recurrence analysis of site ${(await this.sites.findById(analysis.siteId))?.name ?? 'a deleted site'}`;
    const segment = analysis.segmentId ? await this.provenance.segmentName(analysis.segmentId) : null;
    return `recurrence analysis of segment ${segment ?? 'a deleted segment'}${hypothesis ? ` under ${hypothesis.name}` : ''}`;
  }

  /** Queue a fresh result like the stale one: same settings and seed, today's inputs. */
  private async rerun(user: AuthUser, step: RefreshStepRow): Promise<string> {
    if (step.resultKind === 'ageModelRun') {
      const stale = await this.repository.ageModelRun(step.staleId);
      if (!stale) throw notFound('the stale age model run');
      const site = await this.sites.get(user, stale.siteId, Permission.AgeModelRun);
      const settings = stale.settings as Partial<Record<'iterations' | 'chains' | 'outlierPrior' | 'inheritanceScaleYears', number>>;
      const run = await this.ageModels.queue(site, { seed: stale.seed, iterations: settings.iterations, chains: settings.chains, outlierPrior: settings.outlierPrior, inheritanceScaleYears: settings.inheritanceScaleYears }, user);
      return run.id;
    }
    if (step.resultKind === 'recurrenceAnalysis') {
      const stale = await this.repository.recurrenceAnalysis(step.staleId);
      if (!stale) throw notFound('the stale recurrence analysis');
      const settings = stale.settings as { drawsRequested?: number };
      // A segment analysis counts its events by the rule it was started with (stored with its event table).
      const rule = eventTableOf(stale)?.rule;
      const fresh = await this.recurrence.start(user, {
        countingRule: rule ? { ...rule } : null,
        segmentId: stale.segmentId,
        siteId: stale.segmentId ? null : stale.siteId,
        hypothesisId: stale.hypothesisId,
        forecastStartYear: stale.forecastStartYear,
        windowsYears: stale.windowsYears,
        draws: settings.drawsRequested ?? stale.draws,
        seed: stale.seed,
      });
      return fresh.id;
    }
    const kind = this.extraKinds.find((k) => k.kind === step.resultKind);
    if (!kind) throw new Error(`no way to re-run a ${step.resultKind}`);
    return kind.rerun(user, step.staleId);
  }

  private statusesOf(kind: ResultKind, ids: string[]) {
    if (kind === 'ageModelRun' || kind === 'recurrenceAnalysis') return this.repository.statuses(kind, ids);
    const extra = this.extraKinds.find((k) => k.kind === kind);
    return extra ? extra.statuses(ids) : Promise.resolve(new Map<string, { status: string; message: string | null }>());
  }
}
