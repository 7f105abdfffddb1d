import { useGraphqlMutation } from '@/modules/api/hooks/useGraphqlMutation';
import { projectQueries } from '@/modules/projects/hooks/projectQueries';
import {
  CreateEventHorizonDocument,
  CreateUnitDocument,
  DeleteEventHorizonDocument,
  DeleteUnitDocument,
  UpdateEventHorizonDocument,
  UpdateUnitDocument,
} from '@/modules/sites/graphql/site';

/**
 * A change to a column touches the site page, the project's counts and anything computed from
 * the column (age models, the ladder), so it invalidates the whole project prefix.
 */
export function useUnitMutations(projectId: string) {
  const invalidates = [projectQueries.detail(projectId)];
  return {
    create: useGraphqlMutation(CreateUnitDocument, { invalidates }),
    update: useGraphqlMutation(UpdateUnitDocument, { invalidates }),
    remove: useGraphqlMutation(DeleteUnitDocument, { invalidates }),
  };
}

export function useEventHorizonMutations(projectId: string) {
  const invalidates = [projectQueries.detail(projectId)];
  return {
    create: useGraphqlMutation(CreateEventHorizonDocument, { invalidates }),
    update: useGraphqlMutation(UpdateEventHorizonDocument, { invalidates }),
    remove: useGraphqlMutation(DeleteEventHorizonDocument, { invalidates }),
  };
}
