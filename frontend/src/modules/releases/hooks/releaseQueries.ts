import { queryOptions } from '@tanstack/react-query';
import { useGraphqlMutation } from '@/modules/api/hooks/useGraphqlMutation';
import { graphqlRequest } from '@/modules/api/utils/graphqlClient';
import { projectQueries } from '@/modules/projects/hooks/projectQueries';
import { CreateReleaseDocument, ProjectReleasesDocument, ReleaseDiffDocument, ReleaseDocument } from '@/modules/releases/graphql/releases';

/** Query keys and options for a project's releases, under the project's prefix. */
export const releaseQueries = {
  all: (projectId: string) => [...projectQueries.detail(projectId), 'releases'] as const,
  list: (projectId: string) =>
    queryOptions({
      queryKey: [...releaseQueries.all(projectId), 'list'] as const,
      queryFn: async () => (await graphqlRequest(ProjectReleasesDocument, { id: projectId })).project,
    }),
  // A release never changes once frozen, so what was fetched stays good.
  detail: (projectId: string, releaseId: string) =>
    queryOptions({
      queryKey: [...releaseQueries.all(projectId), 'detail', releaseId] as const,
      queryFn: async () => (await graphqlRequest(ReleaseDocument, { id: releaseId })).release,
      staleTime: Infinity,
    }),
  diff: (projectId: string, fromId: string, toId: string) =>
    queryOptions({
      queryKey: [...releaseQueries.all(projectId), 'diff', fromId, toId] as const,
      queryFn: async () => (await graphqlRequest(ReleaseDiffDocument, { fromId, toId })).releaseDiff,
      staleTime: Infinity,
    }),
};

/** Freeze a release; the release list and the audit trail refresh. */
export function useCreateRelease(projectId: string) {
  return useGraphqlMutation(CreateReleaseDocument, {
    invalidates: [releaseQueries.all(projectId), [...projectQueries.detail(projectId), 'audit']],
  });
}
