import { and, desc, eq, type SQL } from 'drizzle-orm';
import type { Executor } from '../database/database.service';
import { ageModelRuns, sites } from '../database/schema';

/**
 * The one rule for which age model run of a site feeds everything downstream: the ladder,
 * correlation checks and regional events (`LatestRunsService`), site recurrence
 * (`AgeModelRunsRepository.latestSucceededForSite`) and the refresh plan
 * (`RefreshRepository.latestSiteRuns`). Today that is the site's newest successful run; a per-site
 * choice of run changes this query alone.
 *
 * A subquery of run ids (one per site at most) for the sites `siteFilter` (a condition on
 * `sites`) selects, to use as `inArray(ageModelRuns.id, downstreamRunIds(...))` or on its own.
 */
export function downstreamRunIds(executor: Executor, siteFilter: SQL | undefined) {
  return executor
    .selectDistinctOn([ageModelRuns.siteId], { id: ageModelRuns.id })
    .from(ageModelRuns)
    .innerJoin(sites, eq(sites.id, ageModelRuns.siteId))
    .where(and(siteFilter, eq(ageModelRuns.status, 'SUCCEEDED')))
    .orderBy(ageModelRuns.siteId, desc(ageModelRuns.createdAt));
}
