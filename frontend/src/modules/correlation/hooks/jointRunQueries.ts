import { queryOptions } from '@tanstack/react-query';
import { graphqlRequest } from '@/modules/api/utils/graphqlClient';
import { isRunActive } from '@/modules/age-model/utils/ageModelView';
import { JointRunDocument } from '@/modules/correlation/graphql/jointRun';
import { ladderQueries } from '@/modules/correlation/hooks/ladderQueries';

/** How often a queued or running joint run is asked for its chains' progress. */
export const JOINT_RUN_POLL_MS = 1500;

/** Query keys and options of joint age model runs, inside the ladder's key prefix (so ladder changes refetch them). */
export const jointRunQueries = {
  all: (projectId: string) => [...ladderQueries.all(projectId), 'joint-run'] as const,
  run: (projectId: string, runId: string) =>
    queryOptions({
      queryKey: [...jointRunQueries.all(projectId), runId] as const,
      queryFn: async () => (await graphqlRequest(JointRunDocument, { id: runId })).jointAgeModelRun,
      refetchInterval: (query) => (query.state.data && !isRunActive(query.state.data.status) ? false : JOINT_RUN_POLL_MS),
    }),
};
