import { Injectable, OnModuleInit } from '@nestjs/common';
import { Permission } from '../../access/permissions';
import { AuthUser } from '../../auth/auth-user';
import { notFound } from '../../common/errors/domain-error';
import { ProvenanceService } from '../../provenance/provenance.service';
import { RefreshableKind, RefreshService } from '../../provenance/refresh.service';
import { resultKey } from '../../provenance/staleness';
import { HypothesesService } from '../hypotheses.service';
import type { JointRunSettings } from './joint-run-settings';
import { JointRunsRepository } from './joint-runs.repository';
import { JointRunsService } from './joint-runs.service';

/**
 * Joint runs in the refresh of stale results (stage 2: after the site runs of their sites, before
 * the analyses that used them): each hypothesis' newest successful run, when stale and not
 * already being re-run, queued again with its settings and seed.
 */
@Injectable()
export class JointRunRefresh implements RefreshableKind, OnModuleInit {
  readonly kind = 'jointRun' as const;
  readonly stage = 2;
  readonly permission = Permission.CorrelationWrite;
  readonly label = 'joint age model run';

  constructor(
    private readonly refresh: RefreshService,
    private readonly repository: JointRunsRepository,
    private readonly provenance: ProvenanceService,
    private readonly hypotheses: HypothesesService,
    private readonly service: JointRunsService,
  ) {}

  onModuleInit(): void {
    this.refresh.register(this);
  }

  async staleResults(projectId: string): Promise<{ id: string; label: string; siteIds: string[] }[]> {
    const latest = await this.repository.latestSucceededOfProject(projectId);
    const reasons = await this.provenance.staleness(latest.map((r) => ({ kind: 'jointRun' as const, id: r.id })));
    const running = await this.repository.hypothesesBeingRun(latest.map((r) => r.hypothesisId));
    const stale = latest.filter((r) => (reasons.get(resultKey('jointRun', r.id)) ?? []).length > 0 && !running.has(r.hypothesisId));
    return Promise.all(
      stale.map(async (r) => ({
        id: r.id,
        label: `joint age model of hypothesis ${r.hypothesisName}`,
        siteIds: (await this.provenance.inputsOf({ kind: 'jointRun', id: r.id })).filter((i) => i.kind === 'site').map((i) => i.id),
      })),
    );
  }

  async rerun(user: AuthUser, staleId: string): Promise<string> {
    const stale = await this.repository.findRun(staleId);
    if (!stale) throw notFound('the stale joint age model run');
    const hypothesis = await this.hypotheses.get(user, stale.hypothesisId, Permission.CorrelationWrite);
    const settings = stale.settings as JointRunSettings;
    return (await this.service.queue(user, hypothesis, { seed: stale.seed, chains: settings.chains, iterations: settings.iterations })).id;
  }

  statuses(ids: readonly string[]) {
    return this.repository.statuses(ids);
  }
}
