import { useMutation, useQueryClient, type QueryKey } from '@tanstack/react-query';
import type { TypedDocumentString } from '@/gql/graphql';
import { graphqlRequest } from '@/modules/api/utils/graphqlClient';

export type GraphqlMutationOptions = {
  /** Key prefixes whose queries are stale once the mutation succeeds. */
  invalidates: readonly QueryKey[];
};

/**
 * A mutation sending one typed GraphQL document; on success every query under the given key
 * prefixes is invalidated (and refetched if on screen), so lists and charts follow the change.
 */
export function useGraphqlMutation<TResult, TVariables>(
  document: TypedDocumentString<TResult, TVariables>,
  { invalidates }: GraphqlMutationOptions,
) {
  const queryClient = useQueryClient();
  return useMutation<TResult, Error, TVariables>({
    mutationFn: (variables) => graphqlRequest(document, variables),
    onSuccess: async () => {
      await Promise.all(invalidates.map((queryKey) => queryClient.invalidateQueries({ queryKey })));
    },
  });
}
