import { and, desc, eq, sql, type SQL } from 'drizzle-orm';
import type { Executor } from '../database/database.service';
import { ageModelRuns, downstreamRunChoices, sites } from '../database/schema';

/**
 * The one rule for which age model run of a site feeds everything downstream: the ladder,
 * correlation checks and regional events (`LatestRunsService`), site recurrence
 * (`AgeModelRunsRepository.latestSucceededForSite`), the staleness of results that used a run
 * (`ProvenanceRepository.downstreamRuns`) and the refresh plan (`RefreshRepository.latestSiteRuns`).
 *
 * The run a researcher chose for the site (`downstream_run_choices`) when it is a successful run
 * of the site; otherwise the site's newest successful run.
 *
 * A subquery of run ids (one per site at most) for the sites `siteFilter` (a condition on
 * `sites`) selects, to use as `inArray(ageModelRuns.id, downstreamRunIds(...))` or on its own.
 */
export function downstreamRunIds(executor: Executor, siteFilter: SQL | undefined) {
  return executor
    .selectDistinctOn([ageModelRuns.siteId], { id: ageModelRuns.id })
    .from(ageModelRuns)
    .innerJoin(sites, eq(sites.id, ageModelRuns.siteId))
    .leftJoin(downstreamRunChoices, eq(downstreamRunChoices.siteId, ageModelRuns.siteId))
    .where(and(siteFilter, eq(ageModelRuns.status, 'SUCCEEDED')))
    .orderBy(ageModelRuns.siteId, sql`(${ageModelRuns.id} = ${downstreamRunChoices.ageModelRunId}) is true desc`, desc(ageModelRuns.createdAt));
}
