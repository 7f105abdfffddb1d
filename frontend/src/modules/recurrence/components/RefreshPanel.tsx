import { Button, Classes, HTMLTable, Tag } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { graphqlRequest } from '@/modules/api/utils/graphqlClient';
import { useGraphqlMutation } from '@/modules/api/hooks/useGraphqlMutation';
import { projectQueries } from '@/modules/projects/hooks/projectQueries';
import { LatestRefreshDocument, RefreshStaleResultsDocument } from '@/modules/recurrence/graphql/recurrence';

/** Polling interval while a refresh is active. */
const REFRESH_POLL_MS = 2000;

const refreshQueries = {
  all: (projectId: string) => [...projectQueries.detail(projectId), 'refresh'] as const,
  latest: (projectId: string) =>
    queryOptions({
      queryKey: [...refreshQueries.all(projectId), 'latest'] as const,
      queryFn: async () => (await graphqlRequest(LatestRefreshDocument, { projectId })).project.refreshPlans[0] ?? null,
      refetchInterval: (query) => (query.state.data?.status === 'ACTIVE' ? REFRESH_POLL_MS : false),
    }),
};

const STAGE_LABEL: Record<number, string> = { 1: 'site age model', 2: 'joint run', 3: 'analysis' };

export type RefreshPanelProps = { projectId: string };

/** One action that re-runs every stale result in order, and the plan of the latest refresh with its progress. */
export function RefreshPanel({ projectId }: RefreshPanelProps) {
  const latest = useQuery(refreshQueries.latest(projectId));
  const refresh = useGraphqlMutation(RefreshStaleResultsDocument, { invalidates: [projectQueries.detail(projectId)] });
  const plan = latest.data;
  const handleRefresh = () => refresh.mutate({ projectId });
  return (
    <section className="sc-panel">
      <h3>Stale results</h3>
      <p className={Classes.TEXT_MUTED}>
        Re-runs every out-of-date age model and analysis your role may start, site age models first and each analysis once the runs it needs
        are done, with the same settings and seeds.
      </p>
      <Button icon={IconNames.REFRESH} text="Refresh stale results" onClick={handleRefresh} loading={refresh.isPending} disabled={plan?.status === 'ACTIVE'} />
      {refresh.error && <p className={Classes.INTENT_DANGER}>{refresh.error.message}</p>}
      {plan && (
        <>
          <p>
            Latest refresh <span className="num">{new Date(plan.createdAt).toLocaleString()}</span> <Tag minimal>{plan.status.toLowerCase()}</Tag>
            {plan.steps.length === 0 && ' · nothing to re-run'}
          </p>
          {plan.steps.length > 0 && (
            <HTMLTable compact striped className="sc-table">
              <thead>
                <tr>
                  <th>Step</th>
                  <th>Result</th>
                  <th>Status</th>
                  <th>Note</th>
                </tr>
              </thead>
              <tbody>
                {plan.steps.map((step) => (
                  <tr key={step.id}>
                    <td>{STAGE_LABEL[step.stage] ?? step.stage}</td>
                    <td>{step.label}</td>
                    <td>
                      <Tag minimal>{step.status.toLowerCase()}</Tag>
                    </td>
                    <td>{step.message}</td>
                  </tr>
                ))}
              </tbody>
            </HTMLTable>
          )}
          {plan.skipped.length > 0 && (
            <ul className={Classes.TEXT_MUTED}>
              {plan.skipped.map((skip) => (
                <li key={skip.id}>
                  Skipped {skip.label}: {skip.reason}
                </li>
              ))}
            </ul>
          )}
        </>
      )}
    </section>
  );
}
