import type { AgeModelRunRow } from '../age-models/age-model-runs.repository';
import { Injectable } from '@nestjs/common';
import { AccessService } from '../access/access.service';
import { Permission } from '../access/permissions';
import { AuditService } from '../audit/audit.service';
import { AuthUser } from '../auth/auth-user';
import { CorrelationInputError, validateTie, type HypothesisCheck, type Tie } from '../chronology/correlation';
import type { HpdRange } from '../chronology/common/density';
import { asNotFoundOf, badInput, notFound } from '../common/errors/domain-error';
import { withConstraintErrors } from '../common/errors/database-errors';
import { DatabaseService } from '../database/database.service';
import type { EventHorizonRow } from '../event-horizons/event-horizons.repository';
import { ProjectsRepository } from '../projects/projects.repository';
import type { SiteRow } from '../sites/sites.repository';
import { thinDensity, type DensityPoint } from '../chronology/common/density-views';
import { checkProjectHypothesis, forGrouping } from './correlation-adapter';
import { CorrelationDataService, projectEvents, toProjectEvent, type ProjectCorrelationData } from './correlation-data.service';
import { AddTieInput } from './dto/add-tie.input';
import { CreateHypothesisInput, UpdateHypothesisInput } from './dto/create-hypothesis.input';
import { HypothesesRepository, type HypothesisRow, type TieView } from './hypotheses.repository';

/** `RegionalEvent` as the API shows it. */
export interface RegionalEventView {
  id: string;
  /** The hypothesis it is a regional event of (for the joint run's ages beside it). */
  hypothesisId: string;
  members: EventHorizonRow[];
  combinedMedianCalBp: number | null;
  combinedHpd95: readonly HpdRange[];
  combinedDensity: DensityPoint[];
  concordance: number | null;
  concordanceThreshold: number | null;
  concordanceLow: boolean;
  warnings: readonly string[];
  chiSquare: { t: number; df: number; critical5: number; passes: boolean } | null;
  ruptureLengthKm: number | null;
  magnitude: { mw: number; sigma: number; relation: string } | null;
  /** The runs its members' ages came from: each member site's newest successful run. */
  ageModelRuns: AgeModelRunRow[];
}

/** `OrderConflict` as the API shows it. */
export interface OrderConflictView {
  tieA: TieView;
  tieB: TieView;
  message: string;
  ties: TieView[];
  events: EventHorizonRow[];
  sites: SiteRow[];
  steps: { site: SiteRow; older: EventHorizonRow; younger: EventHorizonRow }[];
  regionalEventIds: readonly string[];
}

export interface HypothesisChecksView {
  regionalEvents: RegionalEventView[];
  orderConflicts: OrderConflictView[];
}

function asTie(tie: { id: string; eventAId: string; eventBId: string }): Tie {
  return { id: tie.id, eventAId: tie.eventAId, eventBId: tie.eventBId };
}

/** A correlator's message from the pure checks, as BAD_USER_INPUT on `field`. */
function correlationInput<T>(field: string, work: () => T): T {
  try {
    return work();
  } catch (error) {
    if (error instanceof CorrelationInputError) throw badInput(field, error.message);
    throw error;
  }
}

@Injectable()
export class HypothesesService {
  /** Checks per hypothesis row object: the fields of one request share one computation. */
  private readonly checks = new WeakMap<HypothesisRow, Promise<HypothesisChecksView>>();

  constructor(
    private readonly database: DatabaseService,
    private readonly hypotheses: HypothesesRepository,
    private readonly projects: ProjectsRepository,
    private readonly correlationData: CorrelationDataService,
    private readonly access: AccessService,
    private readonly audit: AuditService,
  ) {}

  /** A hypothesis the caller may act on with `permission`; NOT_FOUND for non-members. */
  async get(user: AuthUser, id: string, permission = Permission.ProjectRead): Promise<HypothesisRow> {
    const hypothesis = await this.hypotheses.findById(id);
    if (!hypothesis) throw notFound('hypothesis');
    await this.access.requireAccess({ user, permission, projectId: hypothesis.projectId, objectName: 'hypothesis' });
    return hypothesis;
  }

  /** For parents already authorised (Project.hypotheses). */
  listForProject(projectId: string): Promise<HypothesisRow[]> {
    return this.hypotheses.listForProject(projectId);
  }

  async preferredForProject(projectId: string): Promise<HypothesisRow | null> {
    return (await this.hypotheses.preferredForProject(projectId)) ?? null;
  }

  /** Same project as the parent, so already authorised. */
  async findById(id: string): Promise<HypothesisRow | null> {
    return (await this.hypotheses.findById(id)) ?? null;
  }

  listTies(hypothesis: HypothesisRow): Promise<TieView[]> {
    return this.hypotheses.listTieViews(hypothesis.id);
  }

  async create(user: AuthUser, input: CreateHypothesisInput): Promise<HypothesisRow> {
    await this.access.requireAccess({ user, permission: Permission.CorrelationWrite, projectId: input.projectId });
    if (input.copyFromId) {
      const source = await this.hypotheses.findById(input.copyFromId);
      if (!source || source.projectId !== input.projectId) throw badInput('copyFromId', 'no such hypothesis in this project');
    }
    return withConstraintErrors(() =>
      this.database.transaction(async (tx) => {
        const row = await this.hypotheses.insert(
          {
            projectId: input.projectId,
            name: input.name,
            description: input.description ?? null,
            authorId: user.id,
            copiedFromId: input.copyFromId ?? null,
          },
          tx,
        );
        const copied = input.copyFromId ? await this.hypotheses.copyTies(input.copyFromId, row.id, tx) : [];
        await this.audit.record(tx, {
          actor: user, projectId: row.projectId, action: 'create', objectType: 'hypothesis', objectId: row.id,
          after: { ...row, copiedTieCount: copied.length },
        });
        await this.audit.recordMany(
          tx,
          copied.map((tie) => ({ actor: user, projectId: row.projectId, action: 'create' as const, objectType: 'tie', objectId: tie.id, after: tie })),
        );
        return row;
      }),
    );
  }

  async update(user: AuthUser, id: string, input: UpdateHypothesisInput): Promise<HypothesisRow> {
    const before = await this.get(user, id, Permission.CorrelationWrite);
    return this.database.transaction(async (tx) => {
      const after = await this.hypotheses.update(
        id,
        { ...(input.name !== undefined ? { name: input.name } : {}), ...(input.description !== undefined ? { description: input.description } : {}) },
        tx,
      );
      await this.audit.record(tx, { actor: user, projectId: before.projectId, action: 'update', objectType: 'hypothesis', objectId: id, before, after });
      return after;
    });
  }

  /** Deleting a hypothesis deletes its ties (ON DELETE CASCADE); copies keep their ties. */
  async delete(user: AuthUser, id: string): Promise<boolean> {
    const before = await this.get(user, id, Permission.CorrelationWrite);
    await this.database.transaction(async (tx) => {
      const ties = await this.hypotheses.listTies(id, tx);
      await this.hypotheses.delete(id, tx);
      await this.audit.record(tx, {
        actor: user, projectId: before.projectId, action: 'delete', objectType: 'hypothesis', objectId: id, before: { ...before, ties },
      });
    });
    return true;
  }

  /**
   * Mark one hypothesis preferred and every other of its project not, in one transaction. The
   * project's hypotheses are locked first, so concurrent calls take turns instead of failing.
   */
  async setPreferred(user: AuthUser, id: string): Promise<HypothesisRow> {
    const found = await this.get(user, id, Permission.CorrelationWrite);
    return withConstraintErrors(() =>
      this.database.transaction(async (tx) => {
        const locked = await this.hypotheses.lockProject(found.projectId, tx);
        const before = locked.find((row) => row.id === id);
        if (!before) throw notFound('hypothesis');
        const unset = await this.hypotheses.unsetOtherPreferred(found.projectId, id, tx);
        const after = before.preferred ? before : await this.hypotheses.update(id, { preferred: true }, tx);
        const entries = unset.map((row) => ({
          actor: user, projectId: row.projectId, action: 'update' as const, objectType: 'hypothesis', objectId: row.id,
          before: { ...row, preferred: true }, after: row,
        }));
        if (!before.preferred) {
          entries.push({ actor: user, projectId: after.projectId, action: 'update', objectType: 'hypothesis', objectId: id, before, after });
        }
        await this.audit.recordMany(tx, entries);
        return after;
      }),
    );
  }

  /**
   * Tie two events of the hypothesis's project. Refused with BAD_USER_INPUT when an event is not
   * in the project, both are of one site, the pair is already tied, or the tie would put two
   * events of one site into one regional event through other ties. The hypothesis is locked so
   * that two concurrent ties cannot together make such a chain.
   */
  async addTie(user: AuthUser, input: AddTieInput): Promise<TieView> {
    const hypothesis = await this.get(user, input.hypothesisId, Permission.CorrelationWrite);
    if (input.eventAId === input.eventBId) throw badInput('eventBId', 'an event cannot be tied to itself');
    return withConstraintErrors(() =>
      this.database.transaction(async (tx) => {
        await this.hypotheses.lock(hypothesis.id, tx);
        const data = await this.hypotheses.listProjectEvents(hypothesis.projectId, tx);
        const eventA = data.find((row) => row.eventHorizon.id === input.eventAId);
        const eventB = data.find((row) => row.eventHorizon.id === input.eventBId);
        if (!eventA) throw badInput('eventAId', 'no such event horizon in this hypothesis’s project');
        if (!eventB) throw badInput('eventBId', 'no such event horizon in this hypothesis’s project');
        const labelA = `"${eventA.eventHorizon.name}" at ${eventA.site.name}`;
        const labelB = `"${eventB.eventHorizon.name}" at ${eventB.site.name}`;
        if (eventA.site.id === eventB.site.id) {
          throw badInput(
            'eventBId',
            `"${eventA.eventHorizon.name}" and "${eventB.eventHorizon.name}" are both at ${eventA.site.name}: two events of one site cannot be the same earthquake`,
          );
        }
        if (await this.hypotheses.findTieBetween(hypothesis.id, input.eventAId, input.eventBId, tx)) {
          throw badInput('eventBId', `${labelA} and ${labelB} are already tied in this hypothesis`);
        }
        const existing = (await this.hypotheses.listTies(hypothesis.id, tx)).map(asTie);
        const events = forGrouping(data.map((row) => toProjectEvent(row, undefined)));
        correlationInput('eventBId', () =>
          validateTie(events, existing, { id: `between ${labelA} and ${labelB}`, eventAId: input.eventAId, eventBId: input.eventBId }),
        );
        const tie = await this.hypotheses.insertTie(
          {
            hypothesisId: hypothesis.id,
            eventAId: input.eventAId,
            eventBId: input.eventBId,
            confidence: input.confidence,
            evidence: input.evidence ?? [],
            note: input.note ?? null,
          },
          tx,
        );
        await this.hypotheses.bumpVersion(hypothesis.id, tx);
        await this.audit.record(tx, { actor: user, projectId: hypothesis.projectId, action: 'create', objectType: 'tie', objectId: tie.id, after: tie });
        return { ...tie, eventA: eventA.eventHorizon, eventB: eventB.eventHorizon };
      }),
    );
  }

  async removeTie(user: AuthUser, id: string): Promise<boolean> {
    const tie = await this.hypotheses.findTie(id);
    if (!tie) throw notFound('tie');
    const hypothesis = await asNotFoundOf('tie', () => this.get(user, tie.hypothesisId, Permission.CorrelationWrite));
    await this.database.transaction(async (tx) => {
      await this.hypotheses.lock(hypothesis.id, tx);
      await this.hypotheses.deleteTie(id, tx);
      await this.hypotheses.bumpVersion(hypothesis.id, tx);
      await this.audit.record(tx, { actor: user, projectId: hypothesis.projectId, action: 'delete', objectType: 'tie', objectId: id, before: tie });
    });
    return true;
  }

  /** Regional events and order conflicts of a hypothesis from its ties and the latest age models. */
  checksOf(hypothesis: HypothesisRow): Promise<HypothesisChecksView> {
    let pending = this.checks.get(hypothesis);
    if (!pending) {
      pending = this.computeChecks(hypothesis);
      this.checks.set(hypothesis, pending);
    }
    return pending;
  }

  private async computeChecks(hypothesis: HypothesisRow): Promise<HypothesisChecksView> {
    const [data, ties, project] = await Promise.all([
      this.correlationData.load(hypothesis.projectId),
      this.hypotheses.listTieViews(hypothesis.id),
      this.projects.findById(hypothesis.projectId),
    ]);
    if (!project) throw notFound('project');
    const check = correlationInput('hypothesisId', () =>
      checkProjectHypothesis(projectEvents(data), ties.map(asTie), project.tectonicSetting),
    );
    return toView(hypothesis.id, check, data, ties);
  }
}

function toView(hypothesisId: string, check: HypothesisCheck, data: ProjectCorrelationData, ties: readonly TieView[]): HypothesisChecksView {
  const horizons = new Map(data.events.map((event) => [event.eventHorizon.id, event.eventHorizon]));
  const tiesById = new Map(ties.map((tie) => [tie.id, tie]));
  const sitesById = new Map(data.sites.map((site) => [site.id, site]));
  return {
    regionalEvents: check.regionalEvents.map((regional) => ({
      id: regional.id,
      hypothesisId,
      members: regional.memberIds.map((id) => horizons.get(id) as EventHorizonRow),
      combinedMedianCalBp: regional.combined?.medianCalBp ?? null,
      combinedHpd95: regional.combined?.hpd95 ?? [],
      combinedDensity: regional.combinedDensity ? thinDensity(regional.combinedDensity) : [],
      concordance: regional.concordance,
      concordanceThreshold: regional.concordanceThreshold,
      concordanceLow: regional.concordanceWarning,
      warnings: regional.notes,
      chiSquare: regional.chiSquare
        ? { t: regional.chiSquare.t, df: regional.chiSquare.df, critical5: regional.chiSquare.critical5, passes: regional.chiSquare.passes }
        : null,
      ruptureLengthKm: regional.ruptureLengthKm,
      magnitude: regional.magnitude ? { mw: regional.magnitude.mw, sigma: regional.magnitude.sigma, relation: regional.magnitude.relation } : null,
      ageModelRuns: regional.siteIds.flatMap((siteId) => {
        const run = data.runsBySite.get(siteId);
        return run ? [run.row] : [];
      }),
    })),
    orderConflicts: check.orderConflicts.map((conflict) => ({
      tieA: tiesById.get(conflict.tieAId) as TieView,
      tieB: tiesById.get(conflict.tieBId) as TieView,
      message: conflict.message,
      ties: conflict.tieIds.map((id) => tiesById.get(id) as TieView),
      events: conflict.eventIds.map((id) => horizons.get(id) as EventHorizonRow),
      sites: conflict.siteIds.map((id) => sitesById.get(id) as SiteRow),
      steps: conflict.steps.map((step) => ({
        site: sitesById.get(step.siteId) as SiteRow,
        older: horizons.get(step.olderEventId) as EventHorizonRow,
        younger: horizons.get(step.youngerEventId) as EventHorizonRow,
      })),
      regionalEventIds: conflict.regionalEventIds,
    })),
  };
}
