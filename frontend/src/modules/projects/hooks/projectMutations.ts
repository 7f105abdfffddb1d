import { useGraphqlMutation } from '@/modules/api/hooks/useGraphqlMutation';
import {
  CreateSegmentDocument,
  CreateSiteDocument,
  DeleteSegmentDocument,
  DeleteSiteDocument,
  UpdateSegmentDocument,
  UpdateSiteDocument,
} from '@/modules/projects/graphql/projects';
import { projectQueries } from '@/modules/projects/hooks/projectQueries';

/** Create, update and delete segments of a project; each refreshes everything in the project. */
export function useSegmentMutations(projectId: string) {
  const invalidates = [projectQueries.detail(projectId)];
  return {
    create: useGraphqlMutation(CreateSegmentDocument, { invalidates }),
    update: useGraphqlMutation(UpdateSegmentDocument, { invalidates }),
    remove: useGraphqlMutation(DeleteSegmentDocument, { invalidates }),
  };
}

/** Create, update and delete sites of a project; each refreshes everything in the project. */
export function useSiteMutations(projectId: string) {
  const invalidates = [projectQueries.detail(projectId)];
  return {
    create: useGraphqlMutation(CreateSiteDocument, { invalidates }),
    update: useGraphqlMutation(UpdateSiteDocument, { invalidates }),
    remove: useGraphqlMutation(DeleteSiteDocument, { invalidates }),
  };
}
