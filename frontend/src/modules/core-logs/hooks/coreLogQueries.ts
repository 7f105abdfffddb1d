import { queryOptions } from '@tanstack/react-query';
import { useGraphqlMutation } from '@/modules/api/hooks/useGraphqlMutation';
import { graphqlRequest } from '@/modules/api/utils/graphqlClient';
import { DeleteCoreLogDocument, SiteCoreLogsDocument, UploadCoreLogDocument } from '@/modules/core-logs/graphql/coreLogs';
import { siteQueries } from '@/modules/sites/hooks/siteQueries';

/** Query keys and options for a core's logs, under the site's key. */
export const coreLogQueries = {
  all: (projectId: string, siteId: string) => [...siteQueries.detail(projectId, siteId), 'core-logs'] as const,
  site: (projectId: string, siteId: string) =>
    queryOptions({
      queryKey: coreLogQueries.all(projectId, siteId),
      queryFn: async () => (await graphqlRequest(SiteCoreLogsDocument, { id: siteId })).site,
    }),
};

export function useCoreLogMutations(projectId: string, siteId: string) {
  const invalidates = [coreLogQueries.all(projectId, siteId)] as const;
  return {
    upload: useGraphqlMutation(UploadCoreLogDocument, { invalidates }),
    remove: useGraphqlMutation(DeleteCoreLogDocument, { invalidates }),
  };
}
