import { queryOptions } from '@tanstack/react-query';
import { graphqlRequest } from '@/modules/api/utils/graphqlClient';
import { projectQueries } from '@/modules/projects/hooks/projectQueries';
import { RecurrenceAnalysisDocument, RecurrenceSetupDocument } from '@/modules/recurrence/graphql/recurrence';
import { isJobActive } from '@/modules/recurrence/utils/recurrenceCharts';

/** How often a queued or running analysis is asked for its progress. */
export const ANALYSIS_POLL_MS = 1000;

/** Query keys and options of the recurrence view, inside the project's key prefix. */
export const recurrenceQueries = {
  all: (projectId: string) => [...projectQueries.detail(projectId), 'recurrence'] as const,
  setup: (projectId: string) =>
    queryOptions({
      queryKey: [...recurrenceQueries.all(projectId), 'setup'] as const,
      queryFn: async () => (await graphqlRequest(RecurrenceSetupDocument, { projectId })).project,
    }),
  analysis: (projectId: string, analysisId: string) =>
    queryOptions({
      queryKey: [...recurrenceQueries.all(projectId), 'analysis', analysisId] as const,
      queryFn: async () => (await graphqlRequest(RecurrenceAnalysisDocument, { id: analysisId })).recurrenceAnalysis,
      refetchInterval: (query) => (query.state.data && !isJobActive(query.state.data.status) ? false : ANALYSIS_POLL_MS),
    }),
};
