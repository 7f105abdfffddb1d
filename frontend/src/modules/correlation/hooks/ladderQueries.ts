import { queryOptions } from '@tanstack/react-query';
import { graphqlRequest } from '@/modules/api/utils/graphqlClient';
import { EventLadderDocument, HypothesisDocument } from '@/modules/correlation/graphql/ladder';
import { projectQueries } from '@/modules/projects/hooks/projectQueries';
import { gridToDensity } from '@/modules/correlation/utils/ladderData';
import type { EventLadderQuery } from '@/gql/graphql';

type WireColumn = EventLadderQuery['eventLadder']['columns'][number];
type WireEvent = WireColumn['events'][number];

/** A ladder column with each event's thinned posterior expanded from its compact grid to points. */
export type LadderColumn = Omit<WireColumn, 'events'> & {
  events: (Omit<WireEvent, 'densityGrid'> & { density: ReturnType<typeof gridToDensity> })[];
};

async function fetchLadder(projectId: string) {
  const result = await graphqlRequest(EventLadderDocument, { projectId });
  const columns: LadderColumn[] = result.eventLadder.columns.map((column) => ({
    ...column,
    events: column.events.map(({ densityGrid, ...event }) => ({ ...event, density: gridToDensity(densityGrid) })),
  }));
  return { ...result, eventLadder: { ...result.eventLadder, columns } };
}

/** Query keys and options of the event ladder, inside the project's key prefix. */
export const ladderQueries = {
  all: (projectId: string) => [...projectQueries.detail(projectId), 'ladder'] as const,
  ladder: (projectId: string) =>
    queryOptions({
      queryKey: [...ladderQueries.all(projectId), 'columns'] as const,
      queryFn: () => fetchLadder(projectId),
    }),
  hypotheses: (projectId: string) => [...ladderQueries.all(projectId), 'hypothesis'] as const,
  hypothesis: (projectId: string, hypothesisId: string) =>
    queryOptions({
      queryKey: [...ladderQueries.hypotheses(projectId), hypothesisId] as const,
      queryFn: async () => (await graphqlRequest(HypothesisDocument, { id: hypothesisId })).hypothesis,
    }),
};
