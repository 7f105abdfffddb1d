import { Injectable } from '@nestjs/common';
import { ProvenanceService } from '../../provenance/provenance.service';
import { RunCache } from '../../age-models/run-cache';
import type { StoredJointResults } from './joint-run-storage';
import { JointRunRow, JointRunsRepository } from './joint-runs.repository';

/** A fresh joint run's stored results, decoded once per process (a succeeded run's results never change). */
export interface FreshJointRun {
  readonly run: JointRunRow;
  readonly results: StoredJointResults;
}

/**
 * The joint run other features may use for a hypothesis: its newest successful run, when no
 * input of it changed since (not stale, through `ProvenanceService`). Regional events show its
 * ages; segment recurrence analyses draw from its regional draws.
 */
@Injectable()
export class FreshJointRunsService {
  private readonly cache = new RunCache<JointRunRow>(20);

  constructor(
    private readonly repository: JointRunsRepository,
    private readonly provenance: ProvenanceService,
  ) {}

  /** The hypothesis' fresh joint run, or null when it has none (never run, running, failed or stale). */
  async forHypothesis(hypothesisId: string): Promise<FreshJointRun | null> {
    const latest = await this.repository.latestSucceededIdOf(hypothesisId);
    if (!latest) return null;
    if (await this.provenance.isStale({ kind: 'jointRun', id: latest })) return null;
    let run = this.cache.get(latest);
    if (!run) {
      run = await this.repository.findRun(latest);
      if (!run) return null;
      this.cache.set(latest, run);
    }
    return run.results ? { run, results: run.results as StoredJointResults } : null;
  }
}
