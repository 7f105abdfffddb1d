import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import { graphqlRequest } from '@/modules/api/utils/graphqlClient';
import { AuditTrailDocument } from '@/modules/audit/graphql/audit';
import { auditTrailInput, type AuditFilters } from '@/modules/audit/utils/auditFilters';
import { projectQueries } from '@/modules/projects/hooks/projectQueries';

/** Query keys and options for a project's audit trail: one key per filter set and page cursor. */
export const auditQueries = {
  all: (projectId: string) => [...projectQueries.detail(projectId), 'audit'] as const,
  page: (projectId: string, filters: AuditFilters, after: string | null) =>
    queryOptions({
      queryKey: [...auditQueries.all(projectId), 'page', filters, after] as const,
      queryFn: async () => (await graphqlRequest(AuditTrailDocument, { input: auditTrailInput(projectId, filters, after) })).auditTrail,
      // The table keeps the page it shows while the next one loads.
      placeholderData: keepPreviousData,
    }),
};
