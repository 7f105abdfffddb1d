import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import type { TieSuggestionsQuery } from '@/gql/graphql';
import { useGraphqlMutation } from '@/modules/api/hooks/useGraphqlMutation';
import { graphqlRequest } from '@/modules/api/utils/graphqlClient';
import { AddTieDocument } from '@/modules/correlation/graphql/ladder';
import { TieSuggestionsDocument } from '@/modules/correlation/graphql/tieSuggestions';
import { ladderQueries } from '@/modules/correlation/hooks/ladderQueries';
import { suggestionKey } from '@/modules/correlation/utils/ladderOverlays';

export type TieSuggestion = TieSuggestionsQuery['tieSuggestions'][number];

/** The confidence an accepted proposal gets: 3, "likely" (the correlator can tie again otherwise). */
export const ACCEPTED_SUGGESTION_CONFIDENCE = 3;

/**
 * Proposed ties between two chosen cores of a hypothesis, and accepting one as a tie with the
 * evidence "log match". Asked only once two different cores are chosen; kept under the ladder's
 * key, so a new tie refreshes which proposals are tied.
 */
export function useTieSuggestions(projectId: string, hypothesisId: string | null) {
  const [cores, setCores] = useState<[string | null, string | null]>([null, null]);
  const [siteAId, siteBId] = cores;
  const ready = hypothesisId !== null && siteAId !== null && siteBId !== null && siteAId !== siteBId;
  const query = useQuery({
    queryKey: [...ladderQueries.all(projectId), 'tie-suggestions', hypothesisId, siteAId, siteBId] as const,
    queryFn: async () =>
      (await graphqlRequest(TieSuggestionsDocument, { input: { hypothesisId: hypothesisId!, siteAId: siteAId!, siteBId: siteBId! } })).tieSuggestions,
    enabled: ready,
    retry: false,
  });
  const addTie = useGraphqlMutation(AddTieDocument, { invalidates: [ladderQueries.all(projectId)] });
  const [acceptingKey, setAcceptingKey] = useState<string | null>(null);
  const accept = (suggestion: TieSuggestion) => {
    if (!hypothesisId) return;
    setAcceptingKey(suggestionKey(suggestion));
    addTie.mutate(
      {
        input: {
          hypothesisId,
          eventAId: suggestion.eventA.id,
          eventBId: suggestion.eventB.id,
          confidence: ACCEPTED_SUGGESTION_CONFIDENCE,
          evidence: ['log match'],
          note: `Accepted from a log-match proposal (score ${suggestion.score.toFixed(2)}, ${suggestion.channels.join(', ')}).`,
        },
      },
      { onSettled: () => setAcceptingKey(null) },
    );
  };
  return {
    siteAId,
    siteBId,
    setCores,
    ready,
    suggestions: ready ? (query.data ?? []) : [],
    loading: ready && query.isFetching,
    error: query.error ?? addTie.error,
    accept,
    acceptingKey,
  };
}

export type TieSuggestionsState = ReturnType<typeof useTieSuggestions>;
