import { queryOptions } from '@tanstack/react-query';
import { graphqlRequest } from '@/modules/api/utils/graphqlClient';
import { ProjectOverviewDocument, ProjectsDocument } from '@/modules/projects/graphql/projects';

/**
 * Query keys and options for projects. Everything fetched inside a project lives under
 * `detail(projectId)`, so a change anywhere in a project invalidates by that one prefix.
 */
export const projectQueries = {
  all: () => ['projects'] as const,
  list: () =>
    queryOptions({
      queryKey: [...projectQueries.all(), 'list'] as const,
      queryFn: async () => (await graphqlRequest(ProjectsDocument, {})).projects,
    }),
  detail: (projectId: string) => [...projectQueries.all(), projectId] as const,
  overview: (projectId: string) =>
    queryOptions({
      queryKey: [...projectQueries.detail(projectId), 'overview'] as const,
      queryFn: async () => (await graphqlRequest(ProjectOverviewDocument, { id: projectId })).project,
    }),
};
