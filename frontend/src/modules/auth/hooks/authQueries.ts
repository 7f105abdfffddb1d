import { queryOptions } from '@tanstack/react-query';
import { MeDocument } from '@/modules/auth/graphql/auth';
import { graphqlRequest } from '@/modules/api/utils/graphqlClient';

/** Query keys and options about the signed-in user. */
export const authQueries = {
  all: () => ['me'] as const,
  me: () =>
    queryOptions({
      queryKey: [...authQueries.all()],
      queryFn: async () => (await graphqlRequest(MeDocument, {})).me,
      staleTime: 5 * 60_000,
    }),
};
