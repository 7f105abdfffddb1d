import { useGraphqlMutation } from '@/modules/api/hooks/useGraphqlMutation';
import { projectQueries } from '@/modules/projects/hooks/projectQueries';
import { CreateSampleDocument, DeleteSampleDocument, UpdateSampleDocument } from '@/modules/samples/graphql/samples';

/** Create, update and delete samples; each refreshes everything in the project (tables, column, calibrations). */
export function useSampleMutations(projectId: string) {
  const invalidates = [projectQueries.detail(projectId)];
  return {
    create: useGraphqlMutation(CreateSampleDocument, { invalidates }),
    update: useGraphqlMutation(UpdateSampleDocument, { invalidates }),
    remove: useGraphqlMutation(DeleteSampleDocument, { invalidates }),
  };
}
