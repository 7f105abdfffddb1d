import { useMutation } from '@tanstack/react-query';
import type { ImportSamplesInput } from '@/gql/graphql';
import { useGraphqlMutation } from '@/modules/api/hooks/useGraphqlMutation';
import { graphqlRequest } from '@/modules/api/utils/graphqlClient';
import { ImportSamplesDocument } from '@/modules/import/graphql/importSamples';
import { projectQueries } from '@/modules/projects/hooks/projectQueries';

/**
 * The two steps of a lab-sheet import: `check` validates and previews without writing
 * (commit false); `commit` writes every row or none and refreshes the project.
 */
export function useImportSamples(projectId: string) {
  const check = useMutation({
    mutationFn: async ({ siteId, csv, columnChoices }: { siteId: string; csv: string; columnChoices: ImportSamplesInput['columnChoices'] }) =>
      (await graphqlRequest(ImportSamplesDocument, { input: { siteId, csv, commit: false, columnChoices } })).importSamples,
  });
  const commit = useGraphqlMutation(ImportSamplesDocument, { invalidates: [projectQueries.detail(projectId)] });
  return { check, commit };
}
