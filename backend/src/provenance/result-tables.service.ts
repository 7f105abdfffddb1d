import { Injectable } from '@nestjs/common';
import { AccessService } from '../access/access.service';
import { Permission } from '../access/permissions';
import { AgeModelRunRow, AgeModelRunsRepository } from '../age-models/age-model-runs.repository';
import { loadDensity, type StoredAgeModelResults, type StoredDensity } from '../age-models/age-model-results';
import { AuthUser } from '../auth/auth-user';
import { summarise } from '../chronology/common/density';
import { conflict, notFound } from '../common/errors/domain-error';
import { checkProjectHypothesis } from '../correlation/correlation-adapter';
import { CorrelationDataService, projectEvents } from '../correlation/correlation-data.service';
import { FreshJointRunsService } from '../correlation/joint-runs/fresh-joint-runs.service';
import type { StoredJointResults } from '../correlation/joint-runs/joint-run-storage';
import { JointRunsRepository } from '../correlation/joint-runs/joint-runs.repository';
import { ReleasesService } from '../releases/releases.service';
import { RECURRENCE_CAUTION } from '../recurrence/recurrence-caution';
import { RecurrenceService, type RecurrenceInputSnapshot } from '../recurrence/recurrence.service';
import { SitesService } from '../sites/sites.service';
import { ProvenanceRepository } from './provenance.repository';
import { ProvenanceService } from './provenance.service';
import { type BundleFigure, eventAgeFigureSvg, figureEventsOf } from './result-figures';
import { AGE_COLUMNS, ageCells, rangesCalBp, type ResultTable, type TableInput, tableCsv, tableJson } from './result-tables';
import { resultKey } from './staleness';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** The downloadable tables of runs, hypotheses, analyses and releases; every read is a member's. */
@Injectable()
export class ResultTablesService {
  constructor(
    private readonly runs: AgeModelRunsRepository,
    private readonly sites: SitesService,
    private readonly access: AccessService,
    private readonly repository: ProvenanceRepository,
    private readonly provenance: ProvenanceService,
    private readonly correlationData: CorrelationDataService,
    private readonly recurrence: RecurrenceService,
    private readonly releases: ReleasesService,
    private readonly freshJointRuns: FreshJointRunsService,
    private readonly jointRuns: JointRunsRepository,
  ) {}

  /** A site run's event ages, oldest first (CONFLICT while the run has no results). */
  async runEvents(user: AuthUser, runId: string): Promise<ResultTable> {
    const run = UUID.test(runId) ? await this.runs.findById(runId) : undefined;
    if (!run) throw notFound('age model run');
    await this.sites.get(user, run.siteId);
    return this.runEventsTable(run);
  }

  private async runEventsTable(run: AgeModelRunRow): Promise<ResultTable> {
    const results = run.results as StoredAgeModelResults | null;
    if (run.status !== 'SUCCEEDED' || !results) throw conflict(`the age model run has no results to export (${run.status})`);
    const site = await this.sites.findById(run.siteId);
    const names = new Map((await this.repository.eventHorizonNames(results.events.map((e) => e.eventHorizonId))).map((h) => [h.id, h.name]));
    const reasons = (await this.provenance.staleness([{ kind: 'ageModelRun', id: run.id }])).get(resultKey('ageModelRun', run.id)) ?? [];
    const settings = run.settings as Record<string, unknown>;
    const inputs: TableInput[] = [
      { field: 'site', value: site?.name ?? 'a deleted site' },
      { field: 'site id', value: run.siteId },
      { field: 'age model run id', value: run.id },
      { field: 'seed', value: run.seed },
      { field: 'iterations per chain', value: numberOrNull(settings.iterations) },
      { field: 'chains', value: numberOrNull(settings.chains) },
      { field: 'settings', value: JSON.stringify(settings) },
      { field: 'site column revision', value: run.columnRevision },
      { field: 'column fingerprint', value: run.inputFingerprint },
      { field: 'queued', value: run.createdAt.toISOString() },
      { field: 'finished', value: run.finishedAt?.toISOString() ?? null },
      { field: 'stale', value: reasons.length > 0 ? reasons.map((r) => r.message).join('; ') : 'no' },
    ];
    return {
      table: 'event ages',
      inputs,
      columns: [
        { key: 'site', title: 'site' },
        { key: 'event', title: 'event' },
        ...AGE_COLUMNS,
        { key: 'meanCalBp', title: 'mean (cal BP)' },
        { key: 'rhat', title: 'R-hat' },
        { key: 'ess', title: 'ESS' },
        { key: 'eventHorizonId', title: 'event horizon id' },
        { key: 'siteId', title: 'site id' },
      ],
      rows: results.events.map((e) => ({
        site: site?.name ?? null,
        event: names.get(e.eventHorizonId) ?? 'a deleted event horizon',
        ...ageCells(e.summary),
        meanCalBp: e.summary.meanCalBp,
        rhat: e.rhat,
        ess: e.ess,
        eventHorizonId: e.eventHorizonId,
        siteId: run.siteId,
      })),
    };
  }

  /** A hypothesis' regional events from each site's newest successful run, young to old, with their checks. */
  async regionalEvents(user: AuthUser, hypothesisId: string): Promise<ResultTable> {
    const [hypothesis] = UUID.test(hypothesisId) ? await this.repository.hypothesisRows([hypothesisId]) : [];
    if (!hypothesis) throw notFound('hypothesis');
    await this.access.requireAccess({ user, permission: Permission.ProjectRead, projectId: hypothesis.projectId, objectName: 'hypothesis' });
    const [data, ties, project] = await Promise.all([
      this.correlationData.load(hypothesis.projectId),
      this.repository.tiesOf(hypothesis.id),
      this.repository.projectOf(hypothesis.projectId),
    ]);
    const check = checkProjectHypothesis(projectEvents(data), ties, project?.tectonicSetting ?? 'SUBDUCTION_INTERFACE');
    const events = new Map(data.events.map((e) => [e.eventHorizon.id, e]));
    const runsUsed = [...data.runsBySite.entries()].filter(([siteId]) => check.regionalEvents.some((r) => r.siteIds.includes(siteId)));
    const staleness = await this.provenance.staleness(runsUsed.map(([, run]) => ({ kind: 'ageModelRun' as const, id: run.row.id })));
    const siteName = new Map(data.sites.map((s) => [s.id, s.name]));
    // The hypothesis' fresh joint run (succeeded, nothing changed since): its ages beside the independent ones.
    const joint = await this.freshJointRuns.forHypothesis(hypothesis.id);
    const jointOf = new Map((joint?.results.regionalEvents ?? []).map((r) => [r.regionalEventId, r.summary]));
    const inputs: TableInput[] = [
      { field: 'hypothesis', value: hypothesis.name },
      { field: 'hypothesis id', value: hypothesis.id },
      { field: 'hypothesis version', value: hypothesis.version },
      { field: 'tectonic setting', value: project?.tectonicSetting ?? null },
      { field: 'ages from', value: "each site's newest successful age model run" },
      ...runsUsed.map(([siteId, run]): TableInput => ({
        field: `age model run of ${siteName.get(siteId) ?? siteId}`,
        value: `${run.row.id} (seed ${run.row.seed}${(staleness.get(resultKey('ageModelRun', run.row.id)) ?? []).length > 0 ? ', stale' : ''})`,
      })),
      { field: 'order conflicts', value: check.orderConflicts.length },
      { field: 'joint age model run', value: joint ? `${joint.run.id} (seed ${joint.run.seed}, hypothesis version ${joint.run.hypothesisVersion})` : 'none up to date: only the independent ages' },
    ];
    return {
      table: 'regional events',
      inputs,
      columns: [
        { key: 'number', title: 'regional event (1 = youngest)' },
        { key: 'members', title: 'members (site: event)' },
        { key: 'siteCount', title: 'sites' },
        ...AGE_COLUMNS,
        { key: 'jointMedianCalBp', title: 'joint run median (cal BP)' },
        { key: 'jointHpd95CalBp', title: 'joint run 95.4 % (cal BP)' },
        { key: 'ageShown', title: 'age shown' },
        { key: 'concordance', title: 'age concordance' },
        { key: 'chiSquareT', title: 'chi-square T' },
        { key: 'chiSquareDf', title: 'chi-square df' },
        { key: 'chiSquareCritical5', title: 'chi-square critical (5 %)' },
        { key: 'chiSquarePasses', title: 'chi-square passes' },
        { key: 'ruptureLengthKm', title: 'rupture length (km, minimum)' },
        { key: 'magnitudeMw', title: 'Mw from the minimum rupture length (site span; a lower bound)' },
        { key: 'magnitudeSigma', title: 'Mw sigma (of the relation)' },
        { key: 'magnitudeRelation', title: 'scaling relation' },
        { key: 'warnings', title: 'warnings' },
        { key: 'memberIds', title: 'member event horizon ids' },
      ],
      rows: check.regionalEvents.map((r, i) => ({
        number: i + 1,
        members: r.memberIds.map((id) => `${events.get(id)?.site.name}: ${events.get(id)?.eventHorizon.name}`).join('; '),
        siteCount: r.siteIds.length,
        ...ageCells(r.combined),
        jointMedianCalBp: jointOf.get(r.id)?.medianCalBp ?? null,
        jointHpd95CalBp: jointOf.has(r.id) ? rangesCalBp(jointOf.get(r.id)!.hpd95) : null,
        ageShown: jointOf.has(r.id) ? 'joint run' : 'independent (product of member posteriors)',
        concordance: r.concordance,
        chiSquareT: r.chiSquare?.t ?? null,
        chiSquareDf: r.chiSquare?.df ?? null,
        chiSquareCritical5: r.chiSquare?.critical5 ?? null,
        chiSquarePasses: r.chiSquare?.passes ?? null,
        ruptureLengthKm: r.ruptureLengthKm,
        magnitudeMw: r.magnitude?.mw ?? null,
        magnitudeSigma: r.magnitude?.sigma ?? null,
        magnitudeRelation: r.magnitude?.relation ?? null,
        warnings: r.notes.join('; '),
        memberIds: r.memberIds.join(' '),
      })),
    };
  }

  /** The events a recurrence analysis ran on, young to old, with the ages it drew from. */
  async analysisEvents(user: AuthUser, analysisId: string): Promise<ResultTable> {
    const analysis = await this.recurrence.get(user, analysisId);
    const snapshot = analysis.inputSnapshot as RecurrenceInputSnapshot;
    const reasons = (await this.provenance.staleness([{ kind: 'recurrenceAnalysis', id: analysis.id }])).get(resultKey('recurrenceAnalysis', analysis.id)) ?? [];
    const recorded = await this.provenance.inputsOf({ kind: 'recurrenceAnalysis', id: analysis.id });
    const inputs: TableInput[] = [
      { field: 'recurrence analysis id', value: analysis.id },
      { field: 'segment', value: await this.repository.segmentName(analysis.segmentId) },
      { field: 'segment id', value: analysis.segmentId },
      ...recorded.map((i): TableInput => ({
        field: i.kind === 'hypothesis' ? 'hypothesis' : i.kind === 'ageModelRun' ? 'age model run' : 'joint age model run',
        value: i.kind === 'hypothesis' ? `${i.name} version ${i.revision} (${i.id})` : `${i.name} (${i.id})`,
      })),
      { field: 'seed', value: analysis.seed },
      { field: 'draws', value: analysis.draws },
      { field: 'forecast start year (CE)', value: analysis.forecastStartYear },
      { field: 'queued', value: analysis.createdAt.toISOString() },
      { field: 'stale', value: reasons.length > 0 ? reasons.map((r) => r.message).join('; ') : 'no' },
    ];
    const columns = [
      { key: 'number', title: 'event (1 = youngest)' },
      { key: 'members', title: 'members (site: event)' },
      ...AGE_COLUMNS,
      { key: 'memberIds', title: 'member event horizon ids' },
    ];
    if (snapshot.kind === 'segment') {
      const names = await this.memberNames(snapshot.regionalEvents.flatMap((e) => e.memberIds));
      // A JOINT_RUN analysis drew its ages from the joint run: its regional posteriors are the ages it used.
      const jointRun = snapshot.jointRunId ? await this.jointRuns.findRun(snapshot.jointRunId) : undefined;
      const jointOf = new Map(((jointRun?.results as StoredJointResults | null)?.regionalEvents ?? []).map((r) => [r.regionalEventId, r.summary]));
      inputs.push({ field: 'ages drawn from', value: snapshot.jointRunId ? 'the joint age model run (each draw one joint draw of the regional events)' : "each regional event's combined density (product of member posteriors)" });
      return {
        table: 'analysis events',
        caution: RECURRENCE_CAUTION,
        inputs,
        columns: [...columns, { key: 'inclusionProbability', title: 'inclusion probability (counting rule)' }],
        rows: snapshot.regionalEvents.map((e, i) => ({
          number: i + 1,
          members: e.memberIds.map((id) => names.get(id) ?? 'a deleted event').join('; '),
          ...ageCells(jointOf.get(e.id) ?? summarise(loadDensity(e.density as StoredDensity))),
          memberIds: e.memberIds.join(' '),
          inclusionProbability: e.inclusionProbability ?? 1,
        })),
      };
    }
    const run = await this.runs.findById(snapshot.ageModelRunId);
    const posteriors = new Map(((run?.results as StoredAgeModelResults | null)?.events ?? []).map((e) => [e.eventHorizonId, e.summary]));
    const names = await this.memberNames(snapshot.eventHorizonIds);
    // The run's events are stored oldest first; the table reads young to old like the segment's.
    const youngFirst = [...snapshot.eventHorizonIds].reverse();
    return {
      table: 'analysis events',
      caution: RECURRENCE_CAUTION,
      inputs,
      columns,
      rows: youngFirst.map((id, i) => ({ number: i + 1, members: names.get(id) ?? 'a deleted event', ...ageCells(posteriors.get(id) ?? null), memberIds: id })),
    };
  }

  /**
   * A release as one JSON download: its frozen data, every analysis pinned to it with its results,
   * its event table and the event tables of the age model runs it used, each table also as CSV
   * (naming its inputs and seed), and an event-age figure (SVG) drawn from each table's rows.
   */
  async releaseBundle(user: AuthUser, releaseId: string) {
    const release = await this.releases.get(user, releaseId);
    const project = await this.repository.projectOf(release.projectId);
    const pinned = await this.repository.analysesOfRelease(release.id);
    const analyses = [];
    const runTables = new Map<string, ResultTable>();
    const figures: BundleFigure[] = [];
    const jointRuns = new Map<string, { id: string; name: string; usedBy: string[] }>();
    const csvFiles: { name: string; table: string; content: string }[] = [];
    for (const [index, { id, status }] of pinned.entries()) {
      if (status !== 'SUCCEEDED') continue;
      const { json, csv } = await this.recurrence.exportOf(user, id);
      const events = await this.analysisEvents(user, id);
      analyses.push({ results: json, events: tableJson(events) });
      const name = `analysis-${index + 1}`;
      csvFiles.push({ name: `${name}-results.csv`, table: 'analysis results', content: csv }, { name: `${name}-events.csv`, table: events.table, content: tableCsv(events) });
      const segment = this.inputValue(events, 'segment');
      const title = segment ? `Events of the analysis of segment ${segment}` : 'Events of the site analysis';
      figures.push(this.figureOf(`${name}-events.svg`, title, events, (row) => String(row.members)));
      for (const input of await this.provenance.inputsOf({ kind: 'recurrenceAnalysis', id })) {
        if (input.kind === 'jointRun') {
          const entry = jointRuns.get(input.id) ?? { id: input.id, name: input.name, usedBy: [] };
          entry.usedBy.push(id);
          jointRuns.set(input.id, entry);
        }
        if (input.kind !== 'ageModelRun' || runTables.has(input.id)) continue;
        const run = await this.runs.findById(input.id);
        if (run?.status === 'SUCCEEDED') runTables.set(input.id, await this.runEventsTable(run));
      }
    }
    for (const [runId, table] of runTables) {
      const site = String(this.inputValue(table, 'site') ?? runId);
      const name = `age-model-run-${fileSafe(site)}-${runId.slice(0, 8)}`;
      csvFiles.push({ name: `${name}.csv`, table: table.table, content: tableCsv(table) });
      figures.push(this.figureOf(`${name}.svg`, `Event ages at ${site}`, table, (row) => String(row.event)));
    }
    return {
      format: 'stratochron-release-bundle',
      formatVersion: 1,
      release: { id: release.id, number: release.number, note: release.note, createdAt: release.createdAt.toISOString(), project: project?.name ?? null, projectId: release.projectId },
      caution: RECURRENCE_CAUTION,
      data: release.snapshot,
      recurrenceAnalyses: analyses,
      ageModelRuns: [...runTables.values()].map(tableJson),
      /** Joint age model runs the pinned analyses used (their event ages are in each analysis' event table). */
      jointRuns: [...jointRuns.values()],
      csvFiles,
      figures,
      note: 'Age model runs and analyses are computed results, not frozen data: those listed here are the analyses pinned to this release (pinned only while the live data were exactly as released) and the runs they used. Each figure is drawn from the rows of the table it names.',
    };
  }

  /** An event-age figure of a table's rows, subtitled with the table's run or analysis and seed. */
  private figureOf(name: string, title: string, table: ResultTable, labelOf: (row: Record<string, unknown>) => string): BundleFigure {
    const seed = this.inputValue(table, 'seed');
    const source = this.inputValue(table, 'age model run id') ?? this.inputValue(table, 'recurrence analysis id');
    return {
      name,
      title,
      table: table.table,
      mediaType: 'image/svg+xml',
      svg: eventAgeFigureSvg({ title, subtitle: `${table.table} of ${source ?? 'a result'}, seed ${seed ?? 'n/a'}`, events: figureEventsOf(table.rows, labelOf) }),
    };
  }

  private inputValue(table: ResultTable, field: string) {
    return table.inputs.find((i) => i.field === field)?.value ?? null;
  }

  private async memberNames(ids: readonly string[]): Promise<Map<string, string>> {
    return new Map((await this.repository.eventHorizonNames(ids)).map((h) => [h.id, `${h.siteName}: ${h.name}`]));
  }
}

function numberOrNull(value: unknown): number | null {
  return typeof value === 'number' ? value : null;
}

/** A name as part of a file name: letters, digits and dashes. */
function fileSafe(name: string): string {
  return name.normalize('NFKD').replace(/[^A-Za-z0-9]+/g, '-').replace(/^-|-$/g, '').toLowerCase() || 'site';
}
