import { queryOptions } from '@tanstack/react-query';
import { graphqlRequest } from '@/modules/api/utils/graphqlClient';
import { EventLadderDocument, HypothesisDocument } from '@/modules/ladder/graphql/ladder';
import { projectQueries } from '@/modules/projects/hooks/projectQueries';

/** Query keys and options of the event ladder, inside the project's key prefix. */
export const ladderQueries = {
  all: (projectId: string) => [...projectQueries.detail(projectId), 'ladder'] as const,
  ladder: (projectId: string) =>
    queryOptions({
      queryKey: [...ladderQueries.all(projectId), 'columns'] as const,
      queryFn: () => graphqlRequest(EventLadderDocument, { projectId }),
    }),
  hypotheses: (projectId: string) => [...ladderQueries.all(projectId), 'hypothesis'] as const,
  hypothesis: (projectId: string, hypothesisId: string) =>
    queryOptions({
      queryKey: [...ladderQueries.hypotheses(projectId), hypothesisId] as const,
      queryFn: async () => (await graphqlRequest(HypothesisDocument, { id: hypothesisId })).hypothesis,
    }),
};
