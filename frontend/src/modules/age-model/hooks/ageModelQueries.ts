import { queryOptions } from '@tanstack/react-query';
import { graphqlRequest } from '@/modules/api/utils/graphqlClient';
import { AgeModelRunDocument, AgeModelSiteDocument } from '@/modules/age-model/graphql/ageModel';
import { isRunActive } from '@/modules/age-model/utils/ageModelView';
import { withCalibrationPoints } from '@/modules/calibration/utils/calibrationPoints';
import { projectQueries } from '@/modules/projects/hooks/projectQueries';

/** How often a queued or running age model is asked for its progress. */
export const RUN_POLL_MS = 1000;

/** Query keys and options of the age model view, inside the project's key prefix. */
export const ageModelQueries = {
  all: (projectId: string) => [...projectQueries.detail(projectId), 'age-model'] as const,
  site: (projectId: string, siteId: string) =>
    queryOptions({
      queryKey: [...ageModelQueries.all(projectId), 'site', siteId] as const,
      queryFn: async () => {
        const { site } = await graphqlRequest(AgeModelSiteDocument, { id: siteId });
        return site && { ...site, samples: site.samples.map(withCalibrationPoints) };
      },
    }),
  run: (projectId: string, runId: string) =>
    queryOptions({
      queryKey: [...ageModelQueries.all(projectId), 'run', runId] as const,
      queryFn: async () => (await graphqlRequest(AgeModelRunDocument, { id: runId })).ageModelRun,
      refetchInterval: (query) => (query.state.data && !isRunActive(query.state.data.status) ? false : RUN_POLL_MS),
    }),
};
