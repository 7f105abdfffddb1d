import { Injectable } from '@nestjs/common';
import { AuthUser } from '../auth/auth-user';
import { suggestTies, type CoreBed, type CoreForMatching } from '../chronology/correlation';
import { badInput } from '../common/errors/domain-error';
import { CoreLogsService } from '../core-logs/core-logs.service';
import type { CoreLogRow } from '../core-logs/core-logs.repository';
import { EventHorizonsService } from '../event-horizons/event-horizons.service';
import type { EventHorizonRow } from '../event-horizons/event-horizons.repository';
import type { SiteRow } from '../sites/sites.repository';
import { SitesService } from '../sites/sites.service';
import { UnitsService } from '../units/units.service';
import { TieSuggestionsInput } from './dto/tie-suggestions.input';
import { HypothesesRepository } from './hypotheses.repository';
import { HypothesesService } from './hypotheses.service';

/** `TieSuggestion` as the API shows it. */
export interface TieSuggestionView {
  eventA: EventHorizonRow;
  eventB: EventHorizonRow;
  score: number;
  tied: boolean;
  channels: string[];
}

/** The pair of logs (one per core) sharing the most channel names, and those names. */
function sharedLogs(a: readonly CoreLogRow[], b: readonly CoreLogRow[]): { logA: CoreLogRow; logB: CoreLogRow; names: string[] } | null {
  let best: { logA: CoreLogRow; logB: CoreLogRow; names: string[] } | null = null;
  for (const logA of a) {
    for (const logB of b) {
      const inB = new Set(logB.channels.map((c) => c.name.toLowerCase()));
      const names = logA.channels.map((c) => c.name).filter((name) => inB.has(name.toLowerCase()));
      if (names.length > (best?.names.length ?? 0)) best = { logA, logB, names };
    }
  }
  return best;
}

function channelsOf(log: CoreLogRow, names: readonly string[]): CoreForMatching['channels'] {
  return names.map((name) => {
    const index = log.channels.findIndex((c) => c.name.toLowerCase() === name.toLowerCase());
    return { depthsM: log.depthsM, values: log.readings[index] };
  });
}

@Injectable()
export class TieSuggestionsService {
  constructor(
    private readonly hypotheses: HypothesesService,
    private readonly repository: HypothesesRepository,
    private readonly sites: SitesService,
    private readonly units: UnitsService,
    private readonly eventHorizons: EventHorizonsService,
    private readonly logs: CoreLogsService,
  ) {}

  /**
   * Suggested ties between two cores' turbidites under a hypothesis, top down, from their
   * logs' shared channels and bed order (chronology/correlation/tie-suggestions.ts). Ties the
   * hypothesis already has between the two cores anchor the alignment and come back as `tied`.
   * Any member may ask; nothing is written.
   */
  async suggest(user: AuthUser, input: TieSuggestionsInput): Promise<TieSuggestionView[]> {
    const hypothesis = await this.hypotheses.get(user, input.hypothesisId);
    if (input.siteAId === input.siteBId) throw badInput('siteBId', 'choose two different cores');
    const [siteA, siteB] = await Promise.all([this.sites.findById(input.siteAId), this.sites.findById(input.siteBId)]);
    if (!siteA || siteA.projectId !== hypothesis.projectId) throw badInput('siteAId', "the site is not in this hypothesis's project");
    if (!siteB || siteB.projectId !== hypothesis.projectId) throw badInput('siteBId', "the site is not in this hypothesis's project");
    const [logsA, logsB] = await Promise.all([this.logs.listForSite(siteA.id), this.logs.listForSite(siteB.id)]);
    if (logsA.length === 0) throw badInput('siteAId', `${siteA.name} has no core log; upload one first.`);
    if (logsB.length === 0) throw badInput('siteBId', `${siteB.name} has no core log; upload one first.`);
    const shared = sharedLogs(logsA, logsB);
    if (!shared) {
      throw badInput('siteBId', `The logs of ${siteA.name} and ${siteB.name} share no channel name; logs are compared channel by channel.`);
    }
    const [coreA, coreB] = await Promise.all([this.bedsOf(siteA, 'siteAId'), this.bedsOf(siteB, 'siteBId')]);
    const ties = await this.repository.listTies(hypothesis.id);
    const inA = new Set(coreA.beds.map((bed) => bed.eventId));
    const inB = new Set(coreB.beds.map((bed) => bed.eventId));
    const anchors: [string, string][] = [];
    for (const tie of ties) {
      if (inA.has(tie.eventAId) && inB.has(tie.eventBId)) anchors.push([tie.eventAId, tie.eventBId]);
      else if (inA.has(tie.eventBId) && inB.has(tie.eventAId)) anchors.push([tie.eventBId, tie.eventAId]);
    }
    const suggestions = suggestTies(
      { beds: coreA.beds, channels: channelsOf(shared.logA, shared.names) },
      { beds: coreB.beds, channels: channelsOf(shared.logB, shared.names) },
      { anchors },
    );
    return suggestions.map((s) => ({
      eventA: coreA.events.get(s.eventAId) as EventHorizonRow,
      eventB: coreB.events.get(s.eventBId) as EventHorizonRow,
      score: s.score,
      tied: s.anchored,
      channels: shared.names,
    }));
  }

  /** A core's turbidites, top down: each event horizon whose unit above is a TURBIDITE bed. */
  private async bedsOf(site: SiteRow, field: string): Promise<{ beds: CoreBed[]; events: Map<string, EventHorizonRow> }> {
    const [units, horizons] = await Promise.all([this.units.listForSite(site.id), this.eventHorizons.listForSite(site.id)]);
    const unitsById = new Map(units.map((unit) => [unit.id, unit]));
    const beds: CoreBed[] = [];
    const events = new Map<string, EventHorizonRow>();
    for (const horizon of horizons) {
      const bed = unitsById.get(horizon.unitAboveId);
      if (!bed || bed.facies !== 'TURBIDITE') continue;
      beds.push({ eventId: horizon.id, topDepthM: bed.topDepthM, baseDepthM: bed.baseDepthM });
      events.set(horizon.id, horizon);
    }
    if (beds.length === 0) {
      throw badInput(field, `${site.name} has no turbidite beds: an event horizon whose unit above has facies TURBIDITE.`);
    }
    beds.sort((p, q) => p.topDepthM - q.topDepthM);
    return { beds, events };
  }
}
